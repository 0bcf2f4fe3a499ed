/** The command line was called wrongly; printed as one line with a pointer to --help. */
export class UsageError extends Error {
  override readonly name = 'UsageError';
}
