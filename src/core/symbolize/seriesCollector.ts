import { ReadError } from '../sequence/readError';
import type { FastaRecord } from '../sequence/sequenceReader';
import { GrowableFloats } from './growableFloats';
import type { MissingPolicy } from './missingPolicy';

/** A real-valued series as read, before symbolization. */
export interface NumericSeries {
  /** The values that are present, in order (missing ones are never stored). */
  readonly values: Float64Array;
  /**
   * Stretches of `values` without a missing value inside, in the FASTA records' shape (name, start,
   * length) so that the same per-record analysis applies. 'skip': one segment holding every value.
   * 'split': one per run of present values, named "segment k (from line L)".
   */
  readonly segments: readonly FastaRecord[];
  /** Missing cells or lines seen. */
  readonly missing: number;
  readonly missingPolicy: MissingPolicy;
  /** Line of the first missing value, 0 when there is none. */
  readonly firstMissingLine: number;
}

/** Gathers the values of a series as a reader finds them and applies the missing-value policy. */
export class SeriesCollector {
  private readonly values: GrowableFloats;
  private readonly segments: FastaRecord[] = [];
  private missing = 0;
  private firstMissingLine = 0;
  private segmentStart = 0;
  private segmentLine = 0;

  constructor(
    private readonly policy: MissingPolicy,
    initialCapacity?: number,
  ) {
    this.values = new GrowableFloats(initialCapacity);
  }

  /** A present value found on the given line. */
  value(x: number, line: number): void {
    if (this.values.length === this.segmentStart) this.segmentLine = line;
    this.values.push(x);
  }

  /** True until the first cell (a value or a missing one) has been taken. */
  get untouched(): boolean {
    return this.values.length === 0 && this.missing === 0;
  }

  /** A missing value on the given line. */
  missingValue(line: number): void {
    if (this.missing++ === 0) this.firstMissingLine = line;
    if (this.policy === 'split') this.closeSegment();
  }

  /** @throws ReadError 'empty' when no value is present */
  finish(): NumericSeries {
    const values = this.values.toArray();
    if (values.length === 0) {
      throw new ReadError('empty', this.missing > 0 ? `the series holds no numbers (${this.missing} missing values)` : 'the series holds no numbers');
    }
    if (this.policy === 'split') this.closeSegment();
    else this.segments.push({ name: 'series', start: 0, length: values.length });
    return { values, segments: this.segments, missing: this.missing, missingPolicy: this.policy, firstMissingLine: this.firstMissingLine };
  }

  private closeSegment(): void {
    const length = this.values.length - this.segmentStart;
    if (length > 0) {
      this.segments.push({ name: `segment ${this.segments.length + 1} (from line ${this.segmentLine})`, start: this.segmentStart, length });
    }
    this.segmentStart = this.values.length;
  }
}
