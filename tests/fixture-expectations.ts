/**
 * Fixture files say what they expect in their first comment lines, so the file is its own
 * documentation: `# expect: record/schema line 8`, one line per expected diagnostic. A diagnostic
 * in another file (a CSV data file beside the record) names it, relative to the fixture:
 * `# expect: data/units line 3 in ../data/data-units.csv`.
 */

/** One expected diagnostic: its rule id and the 1-based line of the offending node. */
export interface Expectation {
  rule: string;
  line: number;
  /** the file the diagnostic points into, relative to the fixture; absent for the fixture itself */
  file?: string;
}

const EXPECT = /^#\s*expect:\s*(\S+)\s+line\s+(\d+)(?:\s+in\s+(\S+))?\s*$/;

/** Reads the `# expect: <rule> line <N>` lines from the comment block at the top of a fixture. */
export function readExpectations(source: string): Expectation[] {
  const expectations: Expectation[] = [];
  for (const line of source.split(/\r?\n/)) {
    if (!line.startsWith('#')) break;
    const match = EXPECT.exec(line);
    if (match?.[1] !== undefined && match[2] !== undefined) {
      const expectation: Expectation = { rule: match[1], line: Number(match[2]) };
      if (match[3] !== undefined) expectation.file = match[3];
      expectations.push(expectation);
    }
  }
  return expectations;
}
