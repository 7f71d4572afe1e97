/**
 * A built site reaches its out folder by renames only: it is assembled in a staging folder beside
 * the target (same file system, so a rename is atomic), then the old site is renamed aside, the
 * new one renamed into place and the old one removed. Until that moment the previous site is
 * untouched, so a build that fails or is killed leaves it whole. Leftovers of a killed build
 * carry the build's process id and are cleared (or, for a site renamed aside, put back) by the
 * next build.
 */
import { randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import { cp, mkdir, readdir, rename, rm, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { SITE_MARKER } from './out-folder.ts';

const MARKER_TEXT = 'This folder is a site built by `mechatlas build`; the next build may replace all of it.\n';

/** Hidden names beside the target: `.dist.mechatlas-staging-<pid>-<random>`. */
function sibling(target: string, kind: 'staging' | 'previous'): string {
  return join(
    dirname(target),
    `.${basename(target)}.mechatlas-${kind}-${process.pid}-${randomBytes(4).toString('hex')}`,
  );
}

/** True while a process with this id runs (on this machine). */
export function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Clears what killed builds left beside `target`; a site renamed aside and never replaced is put back. */
export async function clearStaleSiblings(target: string): Promise<void> {
  const parent = dirname(target);
  if (!existsSync(parent)) return;
  const pattern = new RegExp(`^\\.${escapeRegExp(basename(target))}\\.mechatlas-(staging|previous)-(\\d+)-[0-9a-f]+$`);
  for (const name of (await readdir(parent)).sort()) {
    const match = pattern.exec(name);
    if (!match || processAlive(Number(match[2]))) continue;
    if (match[1] === 'previous' && !existsSync(target)) await rename(join(parent, name), target);
    else await rm(join(parent, name), { recursive: true, force: true });
  }
}

/**
 * Moves the built site `built` into `target`: into a staging folder beside it (a rename, or a copy
 * across file systems), with the marker file, then swapped in. Removes the staging folder on failure.
 */
export async function swapSiteInto(built: string, target: string): Promise<void> {
  await mkdir(dirname(target), { recursive: true });
  const staging = sibling(target, 'staging');
  try {
    try {
      await rename(built, staging);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EXDEV') throw error;
      await cp(built, staging, { recursive: true, errorOnExist: true, force: false });
    }
    await writeFile(join(staging, SITE_MARKER), MARKER_TEXT);
    if (!existsSync(target)) {
      await rename(staging, target);
      return;
    }
    const previous = sibling(target, 'previous');
    await rename(target, previous);
    try {
      await rename(staging, target);
    } catch (error) {
      await rename(previous, target);
      throw error;
    }
    await rm(previous, { recursive: true, force: true });
  } finally {
    await rm(staging, { recursive: true, force: true });
  }
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
