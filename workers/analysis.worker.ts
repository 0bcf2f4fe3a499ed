import { expose, releaseProxy } from 'comlink';
import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex } from '@noble/hashes/utils.js';
import { analyzeSequence, createReader, readAll } from '../src/core';
import type { AnalysisResult, AnalysisSettings, ReadResult, ReaderOptions } from '../src/core';
import { demoScenario } from './demoScenarios';

/** Reading reports bytes read; the scan reports each finished block length n and the positions still active. */
export type AnalysisProgress =
  | { readonly kind: 'read'; readonly bytes: number; readonly totalBytes: number }
  | { readonly kind: 'level'; readonly n: number; readonly active: number };
export type ProgressCallback = (progress: AnalysisProgress) => void;
export type FileReadOptions = ReaderOptions & { readonly name: string };

/** Report reading progress about every 4 MiB. */
const READ_REPORT_BYTES = 1 << 22;

async function readBlob(blob: Blob, options: ReaderOptions, onProgress: ProgressCallback): Promise<{ read: ReadResult; hex: string }> {
  const reader = createReader({ ...options, sizeHint: blob.size });
  const hash = sha256.create();
  const stream = blob.stream().getReader();
  let bytes = 0;
  let reported = 0;
  for (;;) {
    const { done, value } = await stream.read();
    if (done) break;
    hash.update(value);
    reader.push(value);
    bytes += value.length;
    if (bytes - reported >= READ_REPORT_BYTES) {
      reported = bytes;
      onProgress({ kind: 'read', bytes, totalBytes: blob.size });
    }
  }
  return { read: reader.finish(), hex: bytesToHex(hash.digest()) };
}

function release(callback: ProgressCallback): void {
  (callback as Partial<Record<typeof releaseProxy, () => void>>)[releaseProxy]?.();
}

const api = {
  /** Reads bytes (a transferred ArrayBuffer, or a File/Blob streamed in chunks), hashes them and analyses the sequence. */
  async analyzeBytes(input: ArrayBuffer | Blob, options: FileReadOptions, settings: AnalysisSettings, onProgress: ProgressCallback): Promise<AnalysisResult> {
    try {
      const { name, ...readerOptions } = options;
      const { read, hex } =
        input instanceof ArrayBuffer
          ? { read: readAll(new Uint8Array(input), readerOptions), hex: bytesToHex(sha256(new Uint8Array(input))) }
          : await readBlob(input, readerOptions, onProgress);
      const result = analyzeSequence(read.sequence, { name, sha256: hex, format: readerOptions.format }, settings, {
        onLevel: (n, active) => onProgress({ kind: 'level', n, active }),
      });
      return read.warnings.length === 0 ? result : { ...result, warnings: [...read.warnings, ...result.warnings] };
    } finally {
      release(onProgress);
    }
  },

  /** Generates an invented demo sequence and analyses it; the generator's exact h and sigma^2 go into result.reference. */
  analyzeDemo(id: string, length: number, seed: number, settings: AnalysisSettings, onProgress: ProgressCallback): AnalysisResult {
    try {
      const demo = demoScenario(id);
      const { entropyRate, sigma2 } = demo.source.facts;
      return analyzeSequence(demo.source.generate(length, seed), { name: demo.title, sha256: null, format: 'generated' }, settings, {
        onLevel: (n, active) => onProgress({ kind: 'level', n, active }),
        reference: { source: demo.title, entropyRateNats: entropyRate, sigma2Nats: sigma2 },
      });
    } finally {
      release(onProgress);
    }
  },
};

expose(api);

export type AnalysisApi = typeof api;
