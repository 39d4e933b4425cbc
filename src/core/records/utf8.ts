/**
 * UTF-8 (RFC 3629) without building the whole byte string: the length of a text's encoding, and
 * an encoder that writes into one fixed typed array and hands it on each time it fills, so a
 * checksum over a large text needs a buffer of 64 KiB rather than a copy of the text (and never
 * a plain number array, which costs about 9 bytes per byte and ended large backups with a fatal
 * out-of-memory error). A lone surrogate becomes U+FFFD, as TextEncoder does.
 * Method: the encoding table of RFC 3629 section 3. Cost: one pass over the UTF-16 code units.
 * Throws nothing. Example: utf8Length('°C') -> 3.
 */

/** Bytes of the UTF-8 encoding of a text. */
export function utf8Length(text: string): number {
  let n = 0;
  const len = text.length;
  for (let i = 0; i < len; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) n += 1;
    else if (c < 0x800) n += 2;
    else if (c >= 0xd800 && c <= 0xdbff && i + 1 < len && (text.charCodeAt(i + 1) & 0xfc00) === 0xdc00) {
      n += 4;
      i++;
    } else n += 3; // the rest of the basic plane, and a lone surrogate as U+FFFD
  }
  return n;
}

/**
 * Writes texts as UTF-8 into one reused buffer; `sink` gets a view of the filled part each time
 * the buffer fills and once at `end()`. The view is only valid during the call (the buffer is
 * reused): hash it or copy it there. Texts are encoded each on its own, so a surrogate pair must
 * not be split across two writes (JSON.stringify's pieces never split one).
 * Example: new Utf8Chunks((b) => seen.push(...b)).write('é') then end() -> seen = [0xc3, 0xa9].
 */
export class Utf8Chunks {
  private readonly buf: Uint8Array;
  private used = 0;
  private flushed = 0;

  constructor(private readonly sink: (bytes: Uint8Array) => void, size = 1 << 16) {
    if (!(size >= 16)) throw new RangeError(`Utf8Chunks needs a buffer of at least 16 bytes, got ${size}`);
    this.buf = new Uint8Array(size);
  }

  /** Bytes written so far (handed on or waiting in the buffer). */
  get bytes(): number {
    return this.flushed + this.used;
  }

  write(text: string): void {
    const buf = this.buf;
    const limit = buf.length - 4;
    const len = text.length;
    let used = this.used;
    for (let i = 0; i < len; i++) {
      if (used > limit) {
        this.sink(buf.subarray(0, used));
        this.flushed += used;
        used = 0;
      }
      let cp = text.charCodeAt(i);
      if (cp < 0x80) {
        buf[used++] = cp;
        continue;
      }
      if (cp >= 0xd800 && cp <= 0xdfff) {
        const lo = cp <= 0xdbff && i + 1 < len ? text.charCodeAt(i + 1) : 0;
        if ((lo & 0xfc00) === 0xdc00) {
          cp = 0x10000 + ((cp - 0xd800) << 10) + (lo - 0xdc00);
          i++;
        } else cp = 0xfffd;
      }
      if (cp < 0x800) {
        buf[used++] = 0xc0 | (cp >> 6);
        buf[used++] = 0x80 | (cp & 63);
      } else if (cp < 0x10000) {
        buf[used++] = 0xe0 | (cp >> 12);
        buf[used++] = 0x80 | ((cp >> 6) & 63);
        buf[used++] = 0x80 | (cp & 63);
      } else {
        buf[used++] = 0xf0 | (cp >> 18);
        buf[used++] = 0x80 | ((cp >> 12) & 63);
        buf[used++] = 0x80 | ((cp >> 6) & 63);
        buf[used++] = 0x80 | (cp & 63);
      }
    }
    this.used = used;
  }

  /** Hands on what is left in the buffer; returns the total number of bytes written. */
  end(): number {
    if (this.used > 0) this.sink(this.buf.subarray(0, this.used));
    this.flushed += this.used;
    this.used = 0;
    return this.flushed;
  }
}
