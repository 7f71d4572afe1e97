/**
 * The energy stage of a derivation (DESIGN.md item 8): the profile of one turnover, the energetic
 * span where every step of the route records its energies, and the check that the declared
 * rate-determining step is the one the span points at. Shaped for the JSON report's `energy`.
 */
import type { MechanismRecord } from '../../model/index.ts';
import type { Route } from '../route/route.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import { energyConditions } from './conditions.ts';
import { energeticSpan, type SpanResult } from './energetic-span.ts';
import { buildEnergyProfile } from './profile.ts';
import type { EnergyProfile, EnergyResult } from '../../model/index.ts';
import { readStepEnergies } from './step-energies.ts';

export type { EnergyResult };

const KJ = 1000;

/** Profile and energetic span of one turnover along the route. */
export function energyAnalysis(
  record: MechanismRecord,
  mechanism: Mechanism,
  route: Route,
): { energy?: EnergyResult; diagnostics: Diagnostic[] } {
  const { conditions, diagnostics } = energyConditions(record);
  const read = readStepEnergies(record, mechanism);
  diagnostics.push(...read.diagnostics);
  const built = buildEnergyProfile({
    mechanism,
    sigma: route.sigma,
    sequence: route.sequence,
    reactants: route.overall.reactants,
    energies: read.energies,
    basis: conditions.basis,
  });
  diagnostics.push(...built.diagnostics);
  const profile = built.profile;
  const energy: EnergyResult = { ...profile, T: conditions.T };
  // A profile with a transition state below a minimum is wrong somewhere; no span is read from it.
  if (profile.schematic || built.diagnostics.some((d) => d.severity === 'error')) return { energy, diagnostics };
  const minima = profile.states.filter((s) => s.kind === 'minimum').map((s) => s.energy! * KJ);
  const transitions = profile.states.filter((s) => s.kind === 'transition').map((s) => s.energy! * KJ);
  const span = energeticSpan({ minima, transitions, T: conditions.T, kind: profile.kind });
  if (!span) return { energy, diagnostics };
  Object.assign(energy, spanFields(profile, span, conditions.basis === 'G'));
  if (conditions.basis !== 'G') {
    diagnostics.push(
      diagnostic(
        'energy/profile',
        'info',
        `the energies are ${conditions.basis === 'H' ? 'enthalpies' : 'electronic energies'}; the span and its determining states are shown, but a turnover frequency needs Gibbs energies`,
        {
          path: ['energy', 'basis'],
        },
      ),
    );
  }
  if (profile.kind === 'cycle' && span.reactionEnergy > 0) {
    diagnostics.push(
      diagnostic(
        'energy/profile',
        'warning',
        `one turnover is endergonic (ΔG_r = +${+(span.reactionEnergy / KJ).toPrecision(6)} kJ/mol): at the standard state the cycle runs backwards`,
        {
          path: ['steps'],
        },
      ),
    );
  }
  diagnostics.push(...rdsAgainstSpan(mechanism, energy));
  return { energy, diagnostics };
}

function spanFields(profile: EnergyProfile, span: SpanResult, gibbs: boolean): Partial<EnergyResult> {
  const transitionStates = profile.states.filter((s) => s.kind === 'transition');
  const step = (i: number) => transitionStates[i - 1]?.step ?? '';
  return {
    span: span.span / KJ,
    tdts_step: step(span.tdts),
    tdts_state: span.tdts,
    tdi_state: span.tdi,
    ...(gibbs && { tof_per_s: span.tof, tof_span_per_s: span.tofSpan }),
    control: {
      transition_states: span.controlTransitions.map((x, k) => ({ index: k + 1, step: step(k + 1), x_tof: x })),
      intermediates: span.controlIntermediates.map((x, j) => ({ index: j, x_tof: x })),
    },
  };
}

// The declared rds is a claim about which transition state limits the rate; the energetic span
// says which one does, measured from the lowest preceding minimum rather than from its own start.
function rdsAgainstSpan(mechanism: Mechanism, energy: EnergyResult): Diagnostic[] {
  const rds = mechanism.steps.find((s) => s.rds);
  if (!rds || energy.tdts_step === undefined || energy.rds_step === undefined || rds.label === energy.tdts_step)
    return [];
  return [
    diagnostic(
      'energy/rds-span',
      'warning',
      `step ${rds.label} is declared rate-determining, but the energetic span puts the TOF-determining transition state at step ${energy.tdts_step} (δE = ${+energy.span!.toPrecision(6)} kJ/mol from state ${energy.tdi_state})`,
      {
        path: ['steps', rds.index, 'rds'],
        actual: rds.label,
        expected: energy.tdts_step,
        note: 'the quantity that matters is the span from the lowest preceding minimum, not the height of the peak and not the single largest barrier',
      },
    ),
  ];
}
