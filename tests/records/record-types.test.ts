/** The record types are generated from the schema; both must agree with each other and the content. */
import { execFile } from 'node:child_process';
import { readFile, readdir } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { loadRecordFile, recordSchema } from '../../src/records/index.ts';

const root = fileURLToPath(new URL('../../', import.meta.url));
const run = promisify(execFile);

describe('generated record types', () => {
  it('src/model/mechanism-record.ts is up to date with the schema (run `npm run types`)', async () => {
    const { stdout } = await run(process.execPath, ['scripts/generate-record-types.mjs', '--stdout'], {
      cwd: root,
    });
    const committed = await readFile(`${root}src/model/mechanism-record.ts`, 'utf8');
    expect(committed).toBe(stdout);
  });

  it('export the names the rest of the code uses', async () => {
    const source = await readFile(`${root}src/model/mechanism-record.ts`, 'utf8');
    const names = [
      'MechanismRecord',
      'SpeciesEntry',
      'StepEntry',
      'StepEnergy',
      'EnergySettings',
      'Observation',
      'Reference',
      'Role',
      'Status',
      'Approximation',
      'QuantityText',
    ];
    for (const name of names) expect(source).toMatch(new RegExp(`export (type|interface) ${name}\\b`));
  });
});

describe('the schema', () => {
  it('describes every property, so editors can show help for each field', () => {
    const defs = recordSchema.$defs as Record<string, { description?: string }>;
    const described = (property: Record<string, unknown>): boolean => {
      if (typeof property.description === 'string') return true;
      const ref = typeof property.$ref === 'string' ? property.$ref.replace('#/$defs/', '') : '';
      return typeof defs[ref]?.description === 'string';
    };
    const missing: string[] = [];
    const walk = (node: unknown, where: string): void => {
      if (typeof node !== 'object' || node === null) return;
      for (const [key, value] of Object.entries(node)) {
        // anyOf branches restate names as `properties: { doi: true }`; those need no description.
        if (key === 'properties' && typeof value === 'object' && value !== null) {
          for (const [name, property] of Object.entries(value as Record<string, unknown>)) {
            if (property === true) continue;
            if (!described(property as Record<string, unknown>)) missing.push(`${where}/${name}`);
          }
        }
        walk(value, `${where}/${key}`);
      }
    };
    walk(recordSchema, '#');
    expect(missing).toEqual([]);
  });
});

describe('demo records in content/mechanisms', () => {
  it('all validate against the schema (there may be none yet)', async () => {
    const dir = `${root}content/mechanisms/`;
    const names = (await readdir(dir).catch(() => [] as string[])).filter((n) => /\.ya?ml$/.test(n));
    for (const name of names) {
      const loaded = await loadRecordFile(`${dir}${name}`);
      const problems = loaded.diagnostics.filter((d) => d.rule.startsWith('record/'));
      expect(problems, name).toEqual([]);
      expect(loaded.record, name).toBeDefined();
    }
  });
});
