/**
 * Which folders `build` may replace. A build swaps a fresh site in for the out folder, so the
 * out folder must never be (or contain) something the user keeps: the root, the home folder,
 * the working folder, a git repository, the records, mechatlas itself. A folder that holds
 * something else is replaced only when an earlier build made it (its marker file) or with --force.
 */
import { existsSync, readdirSync, realpathSync, statSync } from 'node:fs';
import { homedir } from 'node:os';
import { basename, dirname, join, parse, resolve, sep } from 'node:path';
import { PathError } from './output.ts';

/** The file every built site holds, so a later build knows the folder is its own to replace. */
export const SITE_MARKER = '.mechatlas-site';

/** What a build must not replace, and whether the user forced replacing a folder mechatlas did not make. */
export interface OutFolderContext {
  content: string;
  packageRoot: string;
  cwd: string;
  force: boolean;
}

/** The real path of `path`, following symbolic links through the part of it that exists. */
export function realPath(path: string): string {
  const absolute = resolve(path);
  let existing = absolute;
  const rest: string[] = [];
  while (!existsSync(existing)) {
    const parent = dirname(existing);
    if (parent === existing) break;
    rest.unshift(basename(existing));
    existing = parent;
  }
  return join(realpathSync(existing), ...rest);
}

/** The folder holding `.git` at or above `dir` (a repository, or a git worktree), if any. */
export function repositoryRoot(dir: string): string | undefined {
  for (let at = realPath(dir); ; at = dirname(at)) {
    if (existsSync(join(at, '.git'))) return at;
    if (dirname(at) === at) return undefined;
  }
}

/** Folders the out folder must neither be nor contain, each with what it is. */
function protectedFolders(context: OutFolderContext): [string, string][] {
  const folders: [string, string][] = [
    [parse(realPath(context.cwd)).root, 'the root folder'],
    [homedir(), 'your home folder'],
    [context.cwd, 'the working folder'],
    [context.content, 'the content folder'],
    [context.packageRoot, "mechatlas's own folder"],
  ];
  for (const from of [context.cwd, context.content, context.packageRoot]) {
    const repository = repositoryRoot(from);
    if (repository !== undefined) folders.push([repository, 'a git repository']);
  }
  return folders.map(([folder, what]) => [realPath(folder), what]);
}

/** Folders the out folder must not lie anywhere inside: what the site is built from, and git's own. */
function forbiddenInside(target: string, packageRoot: string): string | undefined {
  const sources = ['src', 'public', 'node_modules'].map((name) => realPath(join(packageRoot, name)));
  const source = sources.find((folder) => target === folder || isInside(target, folder));
  if (source !== undefined) return `it is inside ${source}, which mechatlas builds the site from`;
  if (target.split(sep).includes('.git')) return "it is inside a git repository's own .git folder";
  return undefined;
}

function isInside(path: string, folder: string): boolean {
  return path.startsWith(folder.endsWith(sep) ? folder : folder + sep);
}

/**
 * Throws a PathError (exit 2, one line) when `out` must not be replaced by a build; otherwise
 * returns its real path. Nothing is written.
 */
export function checkOutFolder(out: string, context: OutFolderContext): string {
  const target = realPath(out);
  for (const [folder, what] of protectedFolders(context)) {
    if (target === folder) throw new PathError(`refusing to build into ${out}: it is ${what}`);
    if (isInside(folder, target)) throw new PathError(`refusing to build into ${out}: it contains ${what} (${folder})`);
  }
  const inside = forbiddenInside(target, context.packageRoot);
  if (inside !== undefined) throw new PathError(`refusing to build into ${out}: ${inside}`);
  if (!existsSync(target)) return target;
  if (!statSync(target).isDirectory()) throw new PathError(`refusing to build into ${out}: it is a file, not a folder`);
  const entries = readdirSync(target);
  if (entries.includes('.git'))
    throw new PathError(`refusing to build into ${out}: it holds a git repository (.git); build elsewhere and copy`);
  if (entries.length === 0 || entries.includes(SITE_MARKER) || context.force) return target;
  throw new PathError(
    `refusing to build into ${out}: it is not empty and no earlier build made it (no ${SITE_MARKER}); ` +
      'choose another folder, or pass --force to replace it and everything in it',
  );
}
