/** `mechatlas new ID`: writes a record to fill in; never overwrites an existing file. */
import { existsSync, statSync } from 'node:fs';
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { MAX_ID_LENGTH, recordIdProblem } from '../catalogue/index.ts';
import { describeFileSystemError } from './file-system-error.ts';
import { PathError, UsageError, type Output } from './output.ts';

/** Creates DIR/ID.yaml from a commented template. */
export async function newCommand(id: string, dir: string, out: Output): Promise<number> {
  if (recordIdProblem(id) !== undefined)
    throw new UsageError(
      `'${id}' is not a record id: use lower-case letters, digits and single hyphens (at most ${MAX_ID_LENGTH})`,
    );
  const file = join(dir, `${id}.yaml`);
  const twin = join(dir, `${id}.yml`);
  if (existsSync(twin)) throw new UsageError(`${twin} exists already and gives the same id; nothing was written`);
  if (existsSync(dir) && !statSync(dir).isDirectory()) throw new PathError(`${dir} is a file, not a folder`);
  try {
    await mkdir(dir, { recursive: true });
  } catch (error) {
    throw new PathError(describeFileSystemError(error, 'create the folder') ?? `cannot create ${dir}`);
  }
  try {
    await writeFile(file, template(), { flag: 'wx' });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EEXIST')
      throw new UsageError(`${file} exists already; nothing was written`);
    throw new PathError(describeFileSystemError(error, 'write') ?? `cannot write ${file}`);
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
