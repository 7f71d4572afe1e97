/**
 * The derivation cache a command uses: `.mechatlas-cache/derivations/` in the working folder
 * (MECHATLAS_CACHE_DIR names another folder), none with `--no-cache` or MECHATLAS_NO_CACHE=1,
 * and none where the engine's version cannot be known.
 */
import { defaultCacheFolder, openDerivationCache, type DerivationCache } from './derivation-cache.ts';
import { engineVersion } from './engine-version.ts';

/** The cache for a run from `cwd` (default: where the command was run), or undefined when turned off. */
export function catalogueCache(options: { cwd?: string; enabled?: boolean } = {}): DerivationCache | undefined {
  if (options.enabled === false || process.env['MECHATLAS_NO_CACHE'] === '1') return undefined;
  const engine = engineVersion();
  if (engine === undefined) return undefined;
  const cwd = options.cwd ?? process.env['MECHATLAS_CWD'] ?? process.cwd();
  return openDerivationCache(process.env['MECHATLAS_CACHE_DIR'] ?? defaultCacheFolder(cwd), engine);
}
