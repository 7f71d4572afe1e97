/**
 * `mechatlas live [--content DIR] [--port N]`: serves the catalogue on this computer while a
 * chemist writes a record. Astro's development server renders each page when it is asked for,
 * and a small Vite plugin watches the content folder: saving, adding or removing a record drops
 * the server's loaded modules (so the pages read the catalogue afresh, through the derivation
 * cache: only the saved record is derived again) and tells the open page to reload, so the
 * record's page, its species and its system show the derived law, the verdicts and the
 * diagnostics of what was just saved. Nothing is sent anywhere:
 * Astro's usage reporting and its check for a newer version are turned off before Astro loads.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve, sep } from 'node:path';
import { contentFolder } from './content-folder.ts';
import { EXIT } from './exit-status.ts';
import { UsageError, type Output } from './output.ts';
import { packageRoot } from './package-root.ts';

export interface LiveOptions {
  content: string;
  port: number;
  /** the address to listen on; 127.0.0.1 keeps the preview on this computer */
  host: string;
}

/** The part of Vite's development server the plugin uses. */
interface WatchedServer {
  watcher: { add(path: string): void; on(event: string, listener: (path: string) => void): void };
  moduleGraph: { invalidateAll(): void };
  ws: { send(payload: { type: 'full-reload' }): void };
}

/** A Vite plugin: a saved, added or removed file of `folder` reloads the catalogue and the open page. */
function reloadOnSave(folder: string, out: Output) {
  return {
    name: 'mechatlas-reload-on-save',
    configureServer(server: WatchedServer) {
      server.watcher.add(folder);
      const changed = (path: string) => {
        const file = resolve(path);
        if (!file.startsWith(folder + sep)) return;
        out.stdout(`${file.slice(folder.length + 1)} changed: reloading the catalogue\n`);
        server.moduleGraph.invalidateAll();
        server.ws.send({ type: 'full-reload' });
      };
      for (const event of ['change', 'add', 'unlink']) server.watcher.on(event, changed);
    },
  };
}

/** Resolves when the process is asked to stop (Ctrl-C, or a TERM signal). */
function stopRequested(): Promise<void> {
  return new Promise((done) => {
    process.once('SIGINT', () => done());
    process.once('SIGTERM', () => done());
  });
}

/** Serves the catalogue until `until` resolves (by default, until Ctrl-C); exit 0 after a clean stop. */
export async function liveCommand(
  options: LiveOptions,
  out: Output,
  until: Promise<void> = stopRequested(),
): Promise<number> {
  const cwd = process.cwd();
  const { content } = await contentFolder(options.content);
  if (!Number.isInteger(options.port) || options.port < 0 || options.port > 65535)
    throw new UsageError('--port must be a whole number from 0 to 65535');
  const root = packageRoot();
  process.env['MECHATLAS_CONTENT'] = content;
  // File names on the pages stay relative to where the command was run, not to the package.
  process.env['MECHATLAS_CWD'] = cwd;
  // Astro's anonymous usage reporting stays off: a preview sends nothing anywhere.
  process.env['ASTRO_TELEMETRY_DISABLED'] = '1';
  // Nor does it ask the package registry whether a newer Astro exists.
  process.env['ASTRO_DISABLE_UPDATE_CHECK'] = 'true';
  // Astro's (and Vite's) caches for this session live in a folder of its own, removed at the end.
  const cacheDir = await mkdtemp(join(tmpdir(), 'mechatlas-live-'));
  const { dev } = await import('astro');
  process.chdir(root);
  try {
    const server = await dev({
      root,
      cacheDir,
      logLevel: 'info',
      server: { port: options.port, host: options.host },
      devToolbar: { enabled: false },
      vite: { cacheDir: join(cacheDir, 'vite'), plugins: [reloadOnSave(content, out)] },
    });
    const { address, port } = server.address;
    const shown = address.includes(':') ? `[${address}]` : address;
    out.stdout(
      `serving the catalogue of ${options.content} at http://${shown}:${port}/\n` +
        `save a record and its page shows the new derivation; Ctrl-C stops\n`,
    );
    await until;
    await server.stop();
    out.stdout('stopped\n');
    return EXIT.clean;
  } finally {
    process.chdir(cwd);
    await rm(cacheDir, { recursive: true, force: true });
  }
}
