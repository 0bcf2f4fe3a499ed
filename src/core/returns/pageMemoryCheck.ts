import { adviseMemory, memoryAdviceMessage, type MemoryEstimateInput } from './memoryEstimate';

/**
 * The page's memory budget. A page cannot learn how much memory its worker may take (typed arrays
 * lie outside the JS heap that performance.memory describes), so the rule is a fixed 4 GiB: a
 * 64-bit browser tab holds that, and it takes 10^8 binary symbols (about 1.4 GB) with room to spare.
 */
export const PAGE_MEMORY_BUDGET_BYTES = 4 * 2 ** 30;

/**
 * Refuses, before the scan, a run of the workbench whose estimated peak memory exceeds the page's
 * budget, with a message that names what would fit (a chunked run of the command line).
 * @param budgetBytes the page's budget; other values only for tests
 * @throws RangeError with that message
 */
export function pageMemoryCheck(input: Pick<MemoryEstimateInput, 'symbols' | 'alphabetSize' | 'maxN' | 'threads' | 'symbolsShared'>, budgetBytes = PAGE_MEMORY_BUDGET_BYTES): void {
  const message = memoryAdviceMessage(adviseMemory(input, budgetBytes), budgetBytes, 'a fixed budget', 'page');
  if (message !== null) throw new RangeError(message);
}
