/** `mechatlas new ID`: writes a record to fill in; never overwrites an existing file. */
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { UsageError, type Output } from './output.ts';

const SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** Creates DIR/ID.yaml from a commented template. */
export async function newCommand(id: string, dir: string, out: Output): Promise<number> {
  if (!SLUG.test(id)) throw new UsageError(`'${id}' is not a record id: use lower-case letters, digits and hyphens`);
  const file = join(dir, `${id}.yaml`);
  await mkdir(dir, { recursive: true });
  try {
    await writeFile(file, template(), { flag: 'wx' });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EEXIST')
      throw new UsageError(`${file} exists already; nothing was written`);
    throw error;
  }
  out.stdout(`wrote ${file}; fill it in, then run: npx mechatlas check ${file}\n`);
  return 0;
}

function template(): string {
  const today = new Date().toISOString().slice(0, 10);
  return `# A proposed mechanism. Field reference: schemas/mechanism.schema.json
title: A short name for this proposal
system: the-overall-reaction        # rival proposals share this
status: proposed                    # proposed | favoured | disfavoured | withdrawn
added: ${today}
notation: labels                    # or formulas: every symbol a chemical formula, balance checked
tags: []
contributors: []
species:
  A: { name: the substrate }
steps:
  - equation: A + B <=> C           # '<=>' reversible, '->' one-way
  - equation: C -> D
    rds: true                       # the rate-determining step, if there is one
approximation: auto                 # auto | rds | steady_state | both
observations: []                    # measured orders, or the data themselves, e.g.:
#  - id: rates-1
#    T: 298.15 K
#    data:
#      kind: initial_rates           # initial_rates | time_course | temperature_series
#      columns: [A / mM, B / mM, rate / µM s^-1, replicate]   # or file: ../data/rates-1.csv
#      rows:
#        - [1.0, 1.0, 0.50, a]
#        - [2.0, 1.0, 1.01, a]
#        - [1.0, 2.0, 0.98, a]
#        - [2.0, 2.0, 1.97, a]
references: []
notes: |
  Why this proposal, and what would tell it apart from its rivals.
`;
}
