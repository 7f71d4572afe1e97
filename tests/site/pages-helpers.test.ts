import { describe, expect, it } from 'vitest';
import {
  anchorId,
  groupDiagnostics,
  recentRecords,
  roleSummary,
  ruleIndex,
  shortLabels,
  systemView,
  type RecordView,
} from '../../src/site/index.ts';

/** A record view with only what the helpers read. */
function view(
  id: string,
  extra: Partial<RecordView> = {},
  diagnostics: RecordView['report']['diagnostics'] = [],
): RecordView {
  return {
    id,
    file: `content/mechanisms/${id}.yaml`,
    title: id,
    tags: [],
    contributors: [],
    references: [],
    steps: [],
    species: [],
    report: { id, file: `/abs/${id}.yaml`, diagnostics },
    errors: 0,
    warnings: 0,
    survives: true,
    ...extra,
  } as unknown as RecordView;
}

describe('roleSummary', () => {
  it('counts roles, catalyst first, and notes buffering', () => {
    const occurrences = [
      { mechanism: 'a', title: 'A', role: 'intermediate', buffered: false },
      { mechanism: 'b', title: 'B', role: 'catalyst', buffered: false },
      { mechanism: 'c', title: 'C', role: 'catalyst', buffered: true },
      { mechanism: 'd', title: 'D', role: 'third_body', buffered: false },
      { mechanism: 'e', title: 'E', buffered: false },
    ];
    expect(roleSummary(occurrences)).toBe(
      'catalyst in 2, intermediate in 1, third body in 1, no role derived in 1, buffered in 1',
    );
  });
});

describe('shortLabels', () => {
  it.each([
    [
      ['kx7-hydroarylation-alkene-first', 'kx7-hydroarylation-arene-first'],
      ['alkene-first', 'arene-first'],
    ],
    [
      ['acetal-hydrolysis-a1', 'acetal-hydrolysis-a2'],
      ['a1', 'a2'],
    ],
    [
      ['x-a', 'x-a-b'],
      ['a', 'a-b'],
    ],
    [['solo-record'], ['solo-record']],
    [
      ['a-b', 'c-d'],
      ['a-b', 'c-d'],
    ],
  ])('%j', (ids, shorts) => expect(shortLabels(ids)).toEqual(shorts));
});

describe('anchors', () => {
  it('are made of safe characters', () => {
    expect(anchorId('warning-observation/order')).toBe('warning-observation-order');
  });
});

describe('recentRecords', () => {
  it('newest first, undated left out', () => {
    const records = [
      view('a', { added: '2026-01-02' }),
      view('b'),
      view('c', { added: '2026-03-01' }),
      view('d', { added: '2026-02-01' }),
    ];
    expect(recentRecords(records, 2).map((r) => r.id)).toEqual(['c', 'd']);
  });
});

describe('groupDiagnostics', () => {
  it('groups by severity, then rule, in line order, and indexes rules', () => {
    const records = [
      view('x', {}, [
        { rule: 'observation/order', severity: 'warning', message: 'm2', line: 30, column: 1 },
        { rule: 'observation/order', severity: 'warning', message: 'm1', line: 27, column: 18 },
        { rule: 'rate/nonlinear', severity: 'info', message: 'm3', line: 5, column: 1 },
      ]),
    ];
    const groups = groupDiagnostics(records);
    expect(groups.map((g) => [g.severity, g.count])).toEqual([
      ['error', 0],
      ['warning', 2],
      ['info', 1],
    ]);
    expect(groups[1]!.rules[0]).toMatchObject({ rule: 'observation/order', anchor: 'warning-observation-order' });
    expect(groups[1]!.rules[0]!.items.map((i) => i.diagnostic.line)).toEqual([27, 30]);
    expect(ruleIndex(groups).map((r) => r.rule)).toEqual(['observation/order', 'rate/nonlinear']);
  });
});

describe('systemView standings', () => {
  const law = [{ method: 'steady_state', orders: {}, derivation: [] }];
  const judged = (id: string, statuses: string[]) =>
    view(id, {
      report: {
        id,
        file: `/abs/${id}.yaml`,
        diagnostics: [],
        rate_laws: law,
        observations: statuses.map((status, i) => ({
          id: `o${i}`,
          species: 'S',
          method: 'steady_state',
          observed: 1,
          tolerance: 0.1,
          basis: 'limits',
          status,
        })),
      },
    } as Partial<RecordView>);

  it('a rival survives only on passes and not-excluded; no prediction leaves it undecided; a failure rules it out', () => {
    const v = systemView('s', [
      judged('sys-a', ['pass', 'not_excluded']),
      judged('sys-b', ['pass', 'unknown']),
      judged('sys-c', ['fail', 'not_excluded']),
    ]);
    expect(v.rivals.map((r) => [r.id, r.standing, r.survives])).toEqual([
      ['sys-a', 'survives', true],
      ['sys-b', 'undecided', false],
      ['sys-c', 'ruled_out', false],
    ]);
    expect(v.rivals[0]!.tally).toEqual({ pass: 1, fail: 0, not_excluded: 1, unknown: 0 });
  });
});
