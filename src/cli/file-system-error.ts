/**
 * Errors from the file system, said in one line: what could not be done to which path and why,
 * in words, with the system's code in brackets for searching. Never a stack trace: the cause is
 * the path the user gave or the machine's state, not a fault in mechatlas.
 */

const REASONS: Readonly<Record<string, string>> = {
  ENOENT: 'no such file or folder',
  ENOTDIR: 'a part of the path is a file, not a folder',
  EISDIR: 'it is a folder, not a file',
  EEXIST: 'it exists already',
  EACCES: 'permission denied',
  EPERM: 'operation not permitted',
  EROFS: 'the file system is read-only',
  ENOSPC: 'no space left on the device',
  EDQUOT: 'the disk quota is used up',
  ENAMETOOLONG: 'the name is too long',
  ELOOP: 'too many symbolic links',
  EBUSY: 'it is busy',
  EMFILE: 'too many open files',
  ENOTEMPTY: 'the folder is not empty',
  EXDEV: 'it is on another device',
};

const VERBS: Readonly<Record<string, string>> = {
  open: 'open',
  read: 'read',
  write: 'write',
  mkdir: 'create the folder',
  rmdir: 'remove the folder',
  rm: 'remove',
  unlink: 'remove',
  rename: 'move',
  scandir: 'list the folder',
  stat: 'look at',
  lstat: 'look at',
  copyfile: 'copy',
  cp: 'copy',
};

/**
 * A one-line description of a Node file-system error, or undefined when `error` is not one;
 * `verb` says what the command was doing where the system call alone would not (`write`).
 */
export function describeFileSystemError(error: unknown, verb?: string): string | undefined {
  if (typeof error !== 'object' || error === null) return undefined;
  const { code, syscall, path } = error as { code?: unknown; syscall?: unknown; path?: unknown };
  if (typeof code !== 'string' || typeof syscall !== 'string' || !/^E[A-Z]+$/.test(code)) return undefined;
  verb ??= VERBS[syscall] ?? syscall;
  const where = typeof path === 'string' ? ` ${path}` : '';
  return `cannot ${verb}${where}: ${REASONS[code] ?? 'the system refused'} (${code})`;
}
