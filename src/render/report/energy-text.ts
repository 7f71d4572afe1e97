/**
 * A person's view of the energy stage: the states of one turnover with what is present at each,
 * and the energetic span result — TOF-determining transition state and intermediate, δE, the
 * turnover frequency both ways, the degrees of TOF control, and whether the declared rds agrees.
 */
import type { Derivation, EnergyResult } from '../../engine/index.ts';
import { plainNumber, speciesTerms } from '../words/index.ts';

const BASIS_NAME = { G: 'Gibbs energy', H: 'enthalpy', E: 'electronic energy' } as const;

/** Renders the energy profile and energetic span of a derivation as plain text lines. */
export function energyLines(derivation: Derivation): string[] {
  const energy = derivation.energy;
  if (!energy) return [];
  if (energy.schematic) {
    const some = energy.states.some((s) => s.index > 0 && s.energy !== undefined);
    return [
      '',
      `Energy profile: schematic: ${some ? 'energies incomplete (a route step records no barrier or no change)' : 'no energies recorded'}`,
    ];
  }
  const over =
    energy.kind === 'cycle' && energy.carriers.length > 0
      ? `; a cycle through ${energy.carriers.join(', ')}`
      : '; a sequence';
  const lines = [
    '',
    `Energy profile (${BASIS_NAME[energy.basis]} / kJ mol⁻¹ from the starting state, T = ${energy.T} K${over}):`,
  ];
  for (const state of energy.states) {
    const name = state.kind === 'minimum' ? `state ${state.index}` : `‡ ${stepName(state.step)}`;
    const marks = [
      state.kind === 'minimum' && state.index === energy.tdi_state ? 'TDI' : '',
      state.kind === 'transition' && state.index === energy.tdts_state ? 'TDTS' : '',
    ]
      .filter(Boolean)
      .join('');
    const present = state.kind === 'minimum' ? speciesTerms(state.species).join(' + ') : '';
    lines.push(`  ${name.padEnd(14)} ${kj(state.energy).padStart(8)}  ${marks.padEnd(4)}  ${present}`.trimEnd());
  }
  if (energy.overall_change !== undefined)
    lines.push(`  overall: Δr${energy.basis} = ${kj(energy.overall_change)} kJ/mol per turnover (${energy.direction})`);
  lines.push(...spanLines(energy, derivation));
  return lines;
}

function spanLines(energy: EnergyResult, derivation: Derivation): string[] {
  if (energy.span === undefined)
    return ['  no energetic span: the profile does not fit the model (see the problems below)'];
  const tdts = energy.states.find((s) => s.kind === 'transition' && s.index === energy.tdts_state);
  const tdi = energy.states.find((s) => s.kind === 'minimum' && s.index === energy.tdi_state);
  const lines = [
    '',
    'Energetic span (Kozuch–Shaik):',
    `  TOF-determining transition state (TDTS): ‡ ${stepName(energy.tdts_step)} at ${kj(tdts?.energy)} kJ/mol`,
    `  TOF-determining intermediate (TDI):      state ${energy.tdi_state} at ${kj(tdi?.energy)} kJ/mol${tdi ? ` (${speciesTerms(tdi.species).join(' + ')})` : ''}`,
    `  δE = ${kj(energy.span)} kJ/mol${(energy.tdts_state ?? 0) <= (energy.tdi_state ?? 0) ? ' (the TDTS comes before the TDI, so Δr' + energy.basis + ' is added)' : ''}`,
  ];
  if (energy.tof_per_s !== undefined && energy.tof_span_per_s !== undefined) {
    lines.push(
      `  TOF = ${plainNumber(energy.tof_per_s)} s⁻¹ from the full expression; ${plainNumber(energy.tof_span_per_s)} s⁻¹ from δE alone`,
    );
  } else {
    lines.push('  TOF: needs Gibbs energies');
  }
  if (energy.control) {
    const x = (v: number) => v.toFixed(3);
    lines.push(
      `  degree of TOF control, transition states: ${energy.control.transition_states.map((t) => `‡ ${stepName(t.step)} ${x(t.x_tof)}`).join(' · ')}`,
    );
    lines.push(
      `  degree of TOF control, intermediates:     ${energy.control.intermediates.map((t) => `state ${t.index} ${x(t.x_tof)}`).join(' · ')}`,
    );
  }
  lines.push(`  ${rdsAgreement(energy, derivation)}`);
  return lines;
}

function rdsAgreement(energy: EnergyResult, derivation: Derivation): string {
  const declared = derivation.mechanism?.steps.find((s) => s.rds);
  if (!declared) return 'declared rds: none';
  if (declared.label === energy.tdts_step) return `declared rds: step ${declared.label}, the TDTS step — they agree`;
  return `declared rds: step ${declared.label}, but the TDTS is at step ${energy.tdts_step} — they disagree (energy/rds-span)`;
}

function kj(value: number | undefined): string {
  if (value === undefined) return '?';
  const text = value.toFixed(1);
  return Number(text) === 0 ? '0.0' : text;
}

function stepName(label: string | undefined): string {
  return label === undefined ? '?' : /^\d+$/.test(label) ? `step ${label}` : label;
}
