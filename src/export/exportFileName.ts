const UNSAFE = /[^A-Za-z0-9._-]+/g;
const EDGES = /^[._-]+|[._-]+$/g;
const LONGEST_STEM = 60;

/**
 * A file name for an exported figure: the input's name without its extension, then the figure id,
 * e.g. 'heart-rate_convergence.svg'. Anything but ASCII letters, digits, '.', '_' and '-' becomes
 * '-' (no path separators, quotes or markup reach the file system); an empty name falls back to
 * 'returnrate'.
 */
export function exportFileName(inputName: string, figureId: string, extension: string): string {
  const base = inputName.replace(/\.[A-Za-z0-9]{1,8}$/, '');
  const stem = base.replace(UNSAFE, '-').replace(EDGES, '').slice(0, LONGEST_STEM).replace(EDGES, '') || 'returnrate';
  return `${stem}_${figureId.replace(UNSAFE, '-')}.${extension.replace(UNSAFE, '')}`;
}
