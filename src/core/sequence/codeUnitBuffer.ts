/** Longest argument list handed to String.fromCharCode at once (engines cap argument counts). */
const APPLY_LIMIT = 8192;

/**
 * Collects the code points of one token, cell or header as UTF-16 code units, so that a label
 * spanning chunks becomes one short string without building the text around it.
 */
export class CodeUnitBuffer {
  length = 0;
  private units = new Uint16Array(64);

  /** Appends a code point (as a surrogate pair above U+FFFF). */
  pushCodePoint(cp: number): void {
    if (this.length + 2 > this.units.length) this.grow();
    if (cp < 0x10000) {
      this.units[this.length++] = cp;
    } else {
      const v = cp - 0x10000;
      this.units[this.length++] = 0xd800 | (v >> 10);
      this.units[this.length++] = 0xdc00 | (v & 0x3ff);
    }
  }

  /** The i-th code unit collected. */
  unitAt(i: number): number {
    return this.units[i];
  }

  clear(): void {
    this.length = 0;
  }

  /** The collected text. */
  text(): string {
    const { units, length } = this;
    if (length === 1) return String.fromCharCode(units[0]);
    if (length === 2) return String.fromCharCode(units[0], units[1]);
    let s = '';
    for (let start = 0; start < length; start += APPLY_LIMIT) {
      const part = units.subarray(start, Math.min(start + APPLY_LIMIT, length));
      s += String.fromCharCode.apply(null, part as unknown as number[]);
    }
    return s;
  }

  private grow(): void {
    const bigger = new Uint16Array(this.units.length * 2);
    bigger.set(this.units);
    this.units = bigger;
  }
}
