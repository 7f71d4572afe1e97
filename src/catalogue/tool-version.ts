/** The tool's version, read once from package.json. */
import { readFileSync } from 'node:fs';

let cached: string | undefined;

/** The `version` field of mechatlas's package.json. */
export function toolVersion(): string {
  cached ??= (JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
  return cached;
}
