/**
 * Where Astro works during a build. Astro writes server chunks under its out folder and imports
 * them (so its packages must resolve from there), and falls back to `<working folder>/dist` for
 * them when the out folder lies outside the working folder. So each build gets its own folder
 * inside the package's `node_modules/.cache/mechatlas/` and runs Astro from the package folder;
 * one lock per package keeps two builds from sharing Astro's generated files in the package.
 */
import { randomBytes } from 'node:crypto';
import { mkdir, open, readdir, readFile, rm, stat, unlink } from 'node:fs/promises';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import type { Output } from './output.ts';
import { PathError } from './output.ts';
import { processAlive } from './swap-site.ts';

/** How long a build waits for another build of the same package before giving up. */
const LOCK_PATIENCE_MS = 30 * 60 * 1000;

/** The package's build cache folder, where per-build folders and the lock live. */
function cacheFolder(packageRoot: string): string {
  return join(packageRoot, 'node_modules', '.cache', 'mechatlas');
}

/** Takes the package's build lock, waiting for a running build and taking over from a dead one. */
async function acquireLock(lock: string, out: Output): Promise<void> {
  const started = Date.now();
  let told = false;
  for (;;) {
    try {
      const handle = await open(lock, 'wx');
      await handle.writeFile(`${process.pid}\n`);
      await handle.close();
      return;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    }
    const holder = Number.parseInt(await readFile(lock, 'utf8').catch(() => ''), 10);
    const named = Number.isSafeInteger(holder) && holder > 0;
    // A lock without a process id is one whose writer died before writing it (or is writing it now).
    const age = Date.now() - ((await stat(lock).catch(() => undefined))?.mtimeMs ?? Date.now());
    if ((named && !processAlive(holder)) || (!named && age > 5000)) {
      await unlink(lock).catch(() => undefined);
      continue;
    }
    if (Date.now() - started > LOCK_PATIENCE_MS)
      throw new PathError(`another build (process ${holder}) has held ${lock} for 30 minutes; is it stuck?`);
    if (!told) out.stderr(`waiting for another build of the site (process ${holder}) to finish\n`);
    told = true;
    await sleep(250 + Math.floor(Math.random() * 250));
  }
}

/** Removes the working folders of builds whose process is gone. */
async function clearStaleWorkFolders(cache: string): Promise<void> {
  for (const name of await readdir(cache)) {
    const pid = /^build-(\d+)-[0-9a-f]+$/.exec(name)?.[1];
    if (pid !== undefined && !processAlive(Number(pid))) await rm(join(cache, name), { recursive: true, force: true });
  }
}

/** Runs `work` with this build's own working folder, holding the package's build lock; both are removed after. */
export async function withBuildWorkspace<T>(
  packageRoot: string,
  out: Output,
  work: (folder: string) => Promise<T>,
): Promise<T> {
  const cache = cacheFolder(packageRoot);
  await mkdir(cache, { recursive: true });
  const lock = join(cache, 'build.lock');
  await acquireLock(lock, out);
  const folder = join(cache, `build-${process.pid}-${randomBytes(4).toString('hex')}`);
  try {
    await clearStaleWorkFolders(cache);
    await mkdir(folder);
    return await work(folder);
  } finally {
    await rm(folder, { recursive: true, force: true });
    await unlink(lock).catch(() => undefined);
  }
}
