/** A person's view of one derivation: steps with σ, the overall equation, roles, rate laws, energies and simulations. */
import type { CheckedRecord } from '../../catalogue/check-records.ts';
import { energyLines } from './energy-text.ts';
import { rateLawLines } from './rate-law-text.ts';
import { simulationLines } from './simulation-text.ts';

/** Renders the derivation of one checked record as plain text. */
export function derivationText(checked: CheckedRecord): string {
  const { loaded, derivation } = checked;
  const record = loaded.record;
  if (!record) return `${checked.file}: the record could not be read; see the problems below.\n`;
  const lines = [`${record.title}`, `${checked.file} · system ${record.system} · ${record.status}`, ''];
  const mechanism = derivation?.mechanism;
  if (!mechanism) return lines.join('\n') + '\nThe steps could not be read; see the problems below.\n';
  const sigma = derivation.stoichiometricNumbers;
  lines.push(`Steps${sigma ? ` and stoichiometric numbers σ (${derivation.routeSource === 'given' ? 'given' : 'derived'})` : ''}:`);
  const width = Math.max(...mechanism.steps.map((s) => s.text.length));
  for (const step of mechanism.steps) {
    const mark = step.rds ? '  rate-determining' : '';
    const times = sigma ? `  σ = ${sigma[step.index]}${sigma[step.index] === 0 ? ' (off the route)' : ''}` : '';
    lines.push(`  ${step.label.padStart(3)}  ${step.text.padEnd(width)}${times}${mark}`);
  }
  if (derivation.overall) {
    const { overall } = derivation;
    const over = overall.catalysts.length > 0 ? `   (catalyst${overall.catalysts.length > 1 ? 's' : ''}: ${overall.catalysts.join(', ')})` : '';
    lines.push('', `Overall: ${overall.text}${over}`);
  }
  if (derivation.roles) {
    lines.push('', 'Roles:');
    for (const [sp, role] of derivation.roles) {
      const extra = derivation.buffered.includes(sp) ? ', buffered' : '';
      lines.push(`  ${sp.padEnd(12)} ${role.replace('_', ' ')}${extra}`);
    }
  }
  lines.push(...rateLawLines(derivation), ...energyLines(derivation), ...simulationLines(record, derivation));
  lines.push('', 'Derived rate laws are models; decisions on scale-up, thermal hazards or exposure rest with', 'calorimetry, local codes and licensed practice.');
  return lines.join('\n') + '\n';
}
