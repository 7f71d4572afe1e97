/** A person's view of one derivation: steps with σ, the overall equation, roles, rate laws, energies and simulations. */
import type { Derivation } from '../../engine/index.ts';
import type { MechanismRecord } from '../../model/index.ts';
import { roleWords } from '../words/index.ts';
import { energyLines } from './energy-text.ts';
import { rateLawLines } from './rate-law-text.ts';
import { simulationLines } from './simulation-text.ts';

/** What the text is written from: the record file, and the record and its derivation where it could be read. */
export interface DerivedRecord {
  file: string;
  record?: MechanismRecord;
  derivation?: Derivation;
}

/** Renders the derivation of one record as plain text. */
export function derivationText(checked: DerivedRecord): string {
  const { record, derivation } = checked;
  if (!record) return `${checked.file}: the record could not be read; see the problems below.\n`;
  const lines = [`${record.title}`, `${checked.file} · system ${record.system} · ${record.status}`, ''];
  const mechanism = derivation?.mechanism;
  if (!mechanism) return lines.join('\n') + '\nThe steps could not be read; see the problems below.\n';
  const sigma = derivation.stoichiometricNumbers;
  lines.push(
    `Steps${sigma ? ` and stoichiometric numbers σ (${derivation.routeSource === 'given' ? 'given' : 'derived'})` : ''}:`,
  );
  const width = Math.max(...mechanism.steps.map((s) => s.text.length));
  for (const step of mechanism.steps) {
    const mark = step.rds ? '  rate-determining' : '';
    const times = sigma ? `  σ = ${sigma[step.index]}${sigma[step.index] === 0 ? ' (off the route)' : ''}` : '';
    lines.push(`  ${step.label.padStart(3)}  ${step.text.padEnd(width)}${times}${mark}`);
  }
  if (derivation.overall) {
    const { overall } = derivation;
    const over =
      overall.catalysts.length > 0
        ? `   (catalyst${overall.catalysts.length > 1 ? 's' : ''}: ${overall.catalysts.join(', ')})`
        : '';
    lines.push('', `Overall: ${overall.text}${over}`);
  }
  if (derivation.roles) {
    lines.push('', 'Roles:');
    for (const [sp, role] of derivation.roles) {
      const extra = derivation.buffered.includes(sp) ? ', buffered' : '';
      lines.push(`  ${sp.padEnd(12)} ${roleWords(role)}${extra}`);
    }
  }
  const chain = derivation.route?.chain;
  if (chain) {
    const steps = (list: number[]) =>
      list.length === 0 ? 'no step' : `${list.length === 1 ? 'step' : 'steps'} ${list.map((i) => i + 1).join(', ')}`;
    lines.push(
      '',
      `Chain (${chain.source}): carriers ${chain.carriers.join(', ')}; propagation ${steps(chain.propagation)} (the route);`,
      `  initiation ${steps(chain.initiation)} and termination ${steps(chain.termination)} off the route (long-chain convention)`,
    );
  }
  lines.push(...rateLawLines(derivation), ...energyLines(derivation), ...simulationLines(derivation));
  lines.push(
    '',
    'Derived rate laws are models; decisions on scale-up, thermal hazards or exposure rest with',
    'calorimetry, local codes and licensed practice.',
  );
  return lines.join('\n') + '\n';
}
