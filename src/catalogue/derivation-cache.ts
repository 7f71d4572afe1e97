/**
 * The derivation cache: each record's derivation stored under a key made of everything it
 * depends on (derivation-key.ts), in a folder that is safe to delete (by default
 * `.mechatlas-cache/derivations/` in the working folder; git-ignored). An entry names its key and
 * carries a checksum of its bytes; one that does not match, does not decode or cannot be read is
 * ignored, never trusted, and derived again. Writes go to a temporary file renamed into place, so
 * a reader never sees half an entry, and a cache that cannot be written is simply not written.
 */
import { createHash, randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { decodeDerivationValue, encodeDerivationValue } from './derivation-codec.ts';

const MAGIC = 'mechatlas derivation cache 1';

/** What one key stores: the derivation, and the concentration series the site plots. */
export type CachePart = 'derivation' | 'series';

/** A derivation cache: entries by key and part. */
export interface DerivationCache {
  /** the engine version the keys are made with */
  readonly engine: string;
  /** the stored value, or undefined when there is none, or it is damaged or not for this key */
  read(key: string, part: CachePart): unknown;
  /** stores a value; a value that cannot be stored, or a folder that cannot be written, stores nothing */
  write(key: string, part: CachePart, value: unknown): void;
  /** stores bytes already encoded (by a worker thread) */
  writeEncoded(key: string, part: CachePart, bytes: Uint8Array): void;
}

/** The default cache folder under a working folder. */
export function defaultCacheFolder(cwd: string): string {
  return join(cwd, '.mechatlas-cache', 'derivations');
}

function checksum(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** Opens a cache in `folder` for derivations by the engine of version `engine`. */
export function openDerivationCache(folder: string, engine: string): DerivationCache {
  const where = (key: string, part: CachePart) => join(folder, key.slice(0, 2), `${key}.${part}`);
  const writeEncoded = (key: string, part: CachePart, bytes: Uint8Array) => {
    const file = where(key, part);
    const header = Buffer.from(`${MAGIC}\n${key}\n${part}\n${checksum(bytes)}\n`);
    const temporary = `${file}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`;
    try {
      mkdirSync(join(folder, key.slice(0, 2)), { recursive: true });
      writeFileSync(temporary, Buffer.concat([header, bytes]));
      renameSync(temporary, file);
    } catch {
      rmSync(temporary, { force: true });
    }
  };
  return {
    engine,
    read(key, part) {
      let bytes: Buffer;
      try {
        bytes = readFileSync(where(key, part));
      } catch {
        return undefined;
      }
      const lines: string[] = [];
      let at = 0;
      while (lines.length < 4) {
        const end = bytes.indexOf(10, at);
        if (end < 0 || end - at > 200) return undefined;
        lines.push(bytes.toString('utf8', at, end));
        at = end + 1;
      }
      const payload = bytes.subarray(at);
      if (lines[0] !== MAGIC || lines[1] !== key || lines[2] !== part || lines[3] !== checksum(payload))
        return undefined;
      try {
        return decodeDerivationValue(payload);
      } catch {
        return undefined;
      }
    },
    write(key, part, value) {
      let bytes: Buffer;
      try {
        bytes = encodeDerivationValue(value);
      } catch {
        return;
      }
      writeEncoded(key, part, bytes);
    },
    writeEncoded,
  };
}
