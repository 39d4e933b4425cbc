/**
 * Where a JSON text first breaks the grammar of RFC 8259 (section 2 to 7), as a character offset,
 * so an error message can name line and column whatever the JavaScript engine's own message
 * says. Only run after JSON.parse has failed; it checks syntax, not meaning. Iterative, so any
 * depth of nesting is located without recursion. Cost: one pass over the text.
 * Example: jsonErrorOffset('{"a": tru}') -> 9 (where "tru}" stops matching "true").
 */
export function jsonErrorOffset(text: string): number {
  let i = 0;
  const n = text.length;
  class Stop {
    constructor(readonly at: number) {}
  }
  const ws = () => {
    while (i < n && (text[i] === ' ' || text[i] === '\t' || text[i] === '\n' || text[i] === '\r')) i++;
  };
  const stop = (at = i): never => {
    throw new Stop(at);
  };
  const literal = (word: string) => {
    for (let k = 0; k < word.length; k++) if (text[i + k] !== word[k]) stop(i + k);
    i += word.length;
  };
  const string = () => {
    i++; // opening quote
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c === 0x22) return void i++;
      if (c < 0x20) stop();
      if (c === 0x5c) {
        const e = text[i + 1];
        if (e === 'u') {
          for (let k = 2; k < 6; k++) if (!/[0-9a-fA-F]/.test(text[i + k] ?? '')) stop(i + k);
          i += 6;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) i += 2;
        else stop(i + 1);
      } else i++;
    }
    stop();
  };
  const number = () => {
    const m = /-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/y;
    m.lastIndex = i;
    const r = m.exec(text);
    if (!r || r[0] === '' || r[0] === '-') stop();
    i += r![0].length;
  };
  const key = () => {
    ws();
    if (text[i] !== '"') stop();
    string();
    ws();
    if (text[i] !== ':') stop();
    i++;
  };
  const OBJECT = 1;
  const LIST = 2;
  // Iterative, with the open lists and objects on a stack of its own: a text nested thousands
  // deep is located like any other, with no recursion to overflow the call stack.
  const walk = (): number => {
    const open: number[] = [];
    let wantValue = true;
    for (;;) {
      if (wantValue) {
        ws();
        const c = text[i];
        if (c === '{') {
          i++;
          ws();
          if (text[i] === '}') i++;
          else {
            open.push(OBJECT);
            key();
            continue;
          }
        } else if (c === '[') {
          i++;
          ws();
          if (text[i] === ']') i++;
          else {
            open.push(LIST);
            continue;
          }
        } else if (c === '"') string();
        else if (c === 't') literal('true');
        else if (c === 'f') literal('false');
        else if (c === 'n') literal('null');
        else if (c === '-' || (c !== undefined && c >= '0' && c <= '9')) number();
        else stop();
        wantValue = false;
      }
      ws();
      if (open.length === 0) return i < n ? i : -1;
      const top = open[open.length - 1];
      if (text[i] === ',') {
        i++;
        if (top === OBJECT) key();
        wantValue = true;
      } else if ((top === OBJECT && text[i] === '}') || (top === LIST && text[i] === ']')) {
        i++;
        open.pop();
      } else stop();
    }
  };
  try {
    return walk();
  } catch (e) {
    if (e instanceof Stop) return e.at;
    throw e;
  }
}
