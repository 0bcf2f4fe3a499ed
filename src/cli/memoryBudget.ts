import { totalmem } from 'node:os';
import { adviseMemory, memoryAdviceMessage } from '../core';
import type { MemoryEstimateInput } from '../core';
import { UsageError } from './usageError';

type Values = Record<string, string | boolean | undefined>;

const SUFFIX: Record<string, number> = { '': 1, k: 2 ** 10, m: 2 ** 20, g: 2 ** 30, t: 2 ** 40 };

/** --max-memory as bytes: a number with an optional binary suffix K, M, G or T (4G = 4 GiB). */
export function maxMemoryOption(values: Values): number | undefined {
  const raw = values['max-memory'];
  if (raw === undefined) return undefined;
  const m = /^\s*(\d+(?:\.\d+)?(?:e\d+)?)\s*([kmgt]?)i?b?\s*$/i.exec(String(raw));
  const bytes = m === null ? Number.NaN : Number(m[1]) * SUFFIX[m[2]!.toLowerCase()]!;
  if (!(bytes > 0 && Number.isFinite(bytes))) throw new UsageError(`--max-memory must be a size such as 2G, 512M or 1e9; got "${String(raw)}"`);
  return bytes;
}

/**
 * The memory a run may use: --max-memory when given, else 90% of the machine's memory or of the
 * container's limit (cgroup, process.constrainedMemory) when that is smaller.
 */
export function memoryBudget(values: Values): { bytes: number; source: string } {
  const given = maxMemoryOption(values);
  if (given !== undefined) return { bytes: given, source: '--max-memory' };
  // 0 or a huge number when no limit is set; undefined before Node 19.6.
  const limit = (process as { constrainedMemory?: () => number }).constrainedMemory?.() ?? 0;
  const machine = totalmem();
  const bounded = limit > 0 && limit < machine;
  return { bytes: 0.9 * (bounded ? limit : machine), source: bounded ? "90% of the container's memory limit; --max-memory overrides" : "90% of the machine's memory; --max-memory overrides" };
}

/** True when the run's estimated peak memory is within the budget. */
export function fitsMemory(input: MemoryEstimateInput, values: Values): boolean {
  return adviseMemory(input, memoryBudget(values).bytes).kind === 'fits';
}

/** Refuses a run whose estimated peak memory exceeds the budget, saying what would fit. */
export function checkMemory(input: MemoryEstimateInput, values: Values): void {
  const budget = memoryBudget(values);
  const message = memoryAdviceMessage(adviseMemory(input, budget.bytes), budget.bytes, budget.source);
  if (message !== null) throw new RangeError(message);
}
