import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';

// House rules for the stylesheets (common practice for a token-based stylesheet): colors live in
// the tokens file only, and no selector sets a property twice, so no later rule patches an earlier one.
const ui = resolve(dirname(fileURLToPath(import.meta.url)), '../../src/ui');

function cssFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? cssFiles(p) : name.endsWith('.css') ? [p] : [];
  });
}

/** Each rule as (selector, property) pairs: one per comma-separated selector and declaration. */
function rules(body: string, context: string): [string, string][] {
  return [...body.matchAll(/([^{}]+)\{([^{}]*)\}/g)].flatMap((m) => {
    const props = m[2].split(';').map((d) => d.split(':')[0].trim()).filter((p) => p !== '');
    return m[1].split(',').flatMap((sel) => props.map((p): [string, string] => [`${context}${sel.trim().replace(/\s+/g, ' ')}`, p]));
  });
}

/**
 * The same, with a rule inside an @media block keyed by its condition: a narrow screen's own
 * size for a selector is a responsive rule, not a patch, but setting it twice under one
 * condition still is.
 */
function declarations(text: string): [string, string][] {
  let body = text.replace(/\/\*[\s\S]*?\*\//g, '').replace(/@import[^;]*;/g, '');
  const out: [string, string][] = [];
  for (const m of [...body.matchAll(/@media([^{]*)\{((?:[^{}]*\{[^{}]*\})*[^{}]*)\}/g)]) {
    out.push(...rules(m[2], `@media${m[1].trim().replace(/\s+/g, ' ')} `));
    body = body.replace(m[0], '');
  }
  return [...out, ...rules(body, '')];
}

describe('stylesheets', () => {
  const files = cssFiles(ui).filter((f) => !f.includes(`${join('ui', 'harness')}`));
  it('are found', () => {
    expect(files.map((f) => relative(ui, f))).toContain(join('app', 'tokens.css'));
    expect(files.length).toBeGreaterThan(10);
  });
  it('name colors only in the tokens file', () => {
    for (const f of files) {
      if (f.endsWith('tokens.css')) continue;
      const text = readFileSync(f, 'utf8').replace(/\/\*[\s\S]*?\*\//g, '');
      expect(text.match(/#[0-9a-fA-F]{3,8}\b/g) ?? [], relative(ui, f)).toEqual([]);
    }
  });
  it('set each property of a selector once across all of them (no rule patches an earlier one)', () => {
    const seen = new Map<string, string>();
    const twice: string[] = [];
    for (const f of files) {
      for (const [sel, prop] of declarations(readFileSync(f, 'utf8'))) {
        const key = `${sel} { ${prop} }`;
        const before = seen.get(key);
        if (before !== undefined) twice.push(`${key} (${before} and ${relative(ui, f)})`);
        else seen.set(key, relative(ui, f));
      }
    }
    expect(twice).toEqual([]);
  });
});
