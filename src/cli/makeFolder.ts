import { mkdir, stat } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';

/** A folder could not be made; the message says where and why, for the caller's one line. */
export class FolderError extends Error {
  override readonly name = 'FolderError';
}

const REASONS: Readonly<Record<string, string>> = {
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EROFS: 'read-only file system',
  ENOSPC: 'no space left on the device',
};

/**
 * Makes a folder and the folders above it that are missing, one level at a time, and fails with a
 * FolderError naming the level that failed. Node 20's `mkdir(dir, { recursive: true })` never
 * settles under /proc (a non-recursive mkdir there fails at once with ENOENT although the parent
 * exists), so the recursive form is not used.
 */
export async function makeFolder(dir: string): Promise<void> {
  const levels: string[] = [];
  for (let p = resolve(dir); ; p = dirname(p)) {
    levels.unshift(p);
    if (dirname(p) === p) break;
  }
  for (const level of levels) {
    try {
      await mkdir(level);
      continue;
    } catch (e) {
      const code = (e as NodeJS.ErrnoException | null)?.code ?? '';
      if (code === 'EEXIST') {
        if (await isFolder(level)) continue;
        throw new FolderError(`${level} is a file, not a folder`, { cause: e });
      }
      // ENOENT here means the parent exists (made or found one step before) and refuses new folders,
      // as /proc and /sys do.
      if (code === 'ENOENT') throw new FolderError(`${dirname(level)} takes no new folders (ENOENT)`, { cause: e });
      if (code === 'ENOTDIR') throw new FolderError(`${dirname(level)} is a file, not a folder`, { cause: e });
      throw new FolderError(`${REASONS[code] ?? 'cannot make a folder'} at ${level}${code === '' ? '' : ` (${code})`}`, { cause: e });
    }
  }
}

async function isFolder(path: string): Promise<boolean> {
  try {
    return (await stat(path)).isDirectory();
  } catch {
    return false;
  }
}
