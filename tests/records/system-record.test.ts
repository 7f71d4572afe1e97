/**
 * System records (content/systems/<system>.yaml): optional, validated against
 * schemas/system.schema.json, each problem a diagnostic at its line and column.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadSystemSource } from '../../src/records/index.ts';

describe('system records', () => {
  it('reads a title, an overall change and a description', () => {
    const loaded = loadSystemSource(
      'content/systems/kx.yaml',
      'title: Hydroarylation\noverall: A + B -> P\ndescription: An invented system.\n',
    );
    expect(loaded.diagnostics).toEqual([]);
    expect(loaded.system).toBe('kx');
    expect(loaded.record).toEqual({
      title: 'Hydroarylation',
      overall: 'A + B -> P',
      description: 'An invented system.',
    });
  });

  it('places a schema problem at its line and column, and gives no record', () => {
    const loaded = loadSystemSource('systems/kx.yaml', 'title: Hydroarylation\noveral: A + B -> P\n');
    expect(loaded.record).toBeUndefined();
    expect(loaded.diagnostics).toHaveLength(1);
    expect(loaded.diagnostics[0]).toMatchObject({
      rule: 'record/schema',
      severity: 'error',
      file: 'systems/kx.yaml',
      line: 2,
      column: 1,
    });
  });

  it('needs a title, and reports YAML problems as record/yaml with a position, never throwing', () => {
    expect(loadSystemSource('s.yaml', 'overall: A -> B\n').diagnostics[0]).toMatchObject({
      rule: 'record/schema',
      line: 1,
    });
    const broken = loadSystemSource('s.yaml', 'title: [unclosed\n');
    expect(broken.record).toBeUndefined();
    expect(broken.diagnostics[0]).toMatchObject({ rule: 'record/yaml' });
    expect(broken.diagnostics[0]!.line).toBeGreaterThan(0);
  });

  it('every demo system record validates', () => {
    for (const name of readdirSync('content/systems')) {
      const loaded = loadSystemSource(name, readFileSync(`content/systems/${name}`, 'utf8'));
      expect(loaded.diagnostics, name).toEqual([]);
      expect(loaded.record?.title, name).toBeTruthy();
    }
  });
});
