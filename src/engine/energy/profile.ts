/**
 * The energy profile of one turnover along the route: minimum, transition state, minimum, … with
 * every species present at each state. Energies are added up from the steps' own barriers and
 * changes, so a missing value leaves the rest of the profile schematic rather than wrong.
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import type { Rational } from '../exact/rational.ts';
import type { EnergyBasis, EnergyProfile, ProfileState } from '../../model/index.ts';
export type { EnergyProfile, ProfileState };
import type { Step } from '../mechanism/mechanism.ts';
import { speciesRecord, walkSpecies } from './route-species.ts';
import type { StepEnergyValues } from './step-energies.ts';

/** What the profile is built from: the route, the overall reactants and the step energies in J/mol. */
export interface ProfileInput {
  mechanism: Mechanism;
  sigma: readonly number[];
  /** the steps of one turnover in the order they run (Route.sequence) */
  sequence: readonly Step[];
  reactants: ReadonlyMap<string, Rational>;
  energies: readonly StepEnergyValues[];
  basis: EnergyBasis;
}

const KJ = 1000;

/** Builds the states of one turnover and checks that no transition state lies below a neighbouring minimum. */
export function buildEnergyProfile(input: ProfileInput): { profile: EnergyProfile; diagnostics: Diagnostic[] } {
  const { mechanism, sigma, sequence, reactants, energies, basis } = input;
  const walk = walkSpecies(mechanism, sequence, reactants);
  const states: ProfileState[] = [];
  let level: number | undefined = 0;
  states.push({ index: 0, kind: 'minimum', energy: 0, species: speciesRecord(walk.amounts[0]!) });
  sequence.forEach((step, i) => {
    const { barrier, change } = energies[step.index] ?? {};
    const before = speciesRecord(walk.amounts[i]!);
    const ts: ProfileState = { index: i + 1, kind: 'transition', species: before, step: step.label };
    if (level !== undefined && barrier !== undefined) ts.energy = (level + barrier) / KJ;
    states.push(ts);
    level = level !== undefined && change !== undefined ? level + change : undefined;
    const minimum: ProfileState = { index: i + 1, kind: 'minimum', species: speciesRecord(walk.amounts[i + 1]!) };
    if (level !== undefined) minimum.energy = level / KJ;
    states.push(minimum);
  });
  const onRoute = mechanism.steps.filter((s) => (sigma[s.index] ?? 0) > 0);
  const missing = onRoute.filter(
    (s) => energies[s.index]?.barrier === undefined || energies[s.index]?.change === undefined,
  );
  const rds = onRoute.find((s) => s.rds);
  const profile: EnergyProfile = {
    basis,
    unit: 'kJ/mol',
    kind: walk.carriers.length > 0 ? 'cycle' : 'sequence',
    schematic: missing.length > 0,
    states,
    ...(rds && { rds_step: rds.label }),
    carriers: walk.carriers,
  };
  if (level !== undefined) {
    profile.overall_change = level / KJ;
    profile.direction = level < 0 ? 'exergonic' : level > 0 ? 'endergonic' : 'thermoneutral';
  }
  const diagnostics = onRoute.flatMap((s) => transitionStateChecks(s.label, s.index, energies[s.index] ?? {}));
  const someRecorded = onRoute.some(
    (s) => energies[s.index]?.barrier !== undefined || energies[s.index]?.change !== undefined,
  );
  if (someRecorded && missing.length > 0) {
    const labels = missing.map((s) => s.label).join(', ');
    diagnostics.push(
      diagnostic(
        'energy/profile',
        'info',
        `step${missing.length > 1 ? 's' : ''} ${labels} of the route record${missing.length > 1 ? '' : 's'} no barrier or no change, so the profile is schematic and no energetic span is computed`,
        {
          path: ['steps', missing[0]!.index],
        },
      ),
    );
  }
  return { profile, diagnostics };
}

// A transition state is a saddle point between its two minima: below either one, the numbers
// cannot all be right (a sign slip, or the change measured the other way round).
function transitionStateChecks(label: string, index: number, e: StepEnergyValues): Diagnostic[] {
  const path = ['steps', index, 'energy', 'barrier'];
  const kj = (x: number) => `${+(x / KJ).toPrecision(6)} kJ/mol`;
  if (e.barrier === undefined) return [];
  if (e.barrier < 0) {
    return [
      diagnostic(
        'energy/profile',
        'error',
        `the transition state of step ${label} lies below its starting minimum (barrier ${kj(e.barrier)})`,
        { path, actual: e.barrier / KJ },
      ),
    ];
  }
  if (e.change !== undefined && e.barrier < e.change) {
    return [
      diagnostic(
        'energy/profile',
        'error',
        `the transition state of step ${label} lies below the minimum it leads to (barrier ${kj(e.barrier)} < change ${kj(e.change)})`,
        {
          path,
          actual: e.barrier / KJ,
          expected: `at least ${e.change / KJ}`,
          note: 'a barrier is measured from the step’s starting state; the reverse barrier is barrier − change and must not be negative',
        },
      ),
    ];
  }
  return [];
}
