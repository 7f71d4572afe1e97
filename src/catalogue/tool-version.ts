/** The tool's version, taken from package.json when the code is bundled or compiled (no file is read at run time). */
import manifest from '../../package.json' with { type: 'json' };

/** The `version` field of mechatlas's package.json. */
export function toolVersion(): string {
  return manifest.version;
}
