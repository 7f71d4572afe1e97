/**
 * Activation parameters fitted from a temperature series set beside the barrier the record gives
 * for the same constant: ΔG‡ at the record's energy temperature (Gibbs basis), or ΔH‡ (enthalpy
 * basis), against the step's barrier (for k_label) or the energetic span (for k_obs). Outside the
 * 95 % interval of the fit is a warning; electronic energies (basis E) are not compared, since they
 * hold no thermal or entropic part.
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { intervalMultiplier } from './distributions.ts';
import type { EyringFit } from './activation-parameters.ts';

/** What the record gives for the constant the series measured. */
export interface RecordedBarrier {
  /** J/mol */
  value: number;
  basis: 'G' | 'H' | 'E';
  /** where it comes from, in words: "the barrier of step ar", "the energetic span" */
  source: string;
  /** the temperature of the record's energies / K */
  T: number;
}

/** The fitted value compared, with its 95 % interval, in J/mol. */
export interface ActivationComparison {
  quantity: 'ΔG‡' | 'ΔH‡';
  fitted: number;
  standardError: number;
  halfWidth: number;
  recorded: number;
  source: string;
  agrees: boolean;
}

/** Compares the Eyring fit with the recorded barrier; undefined where they cannot be compared. */
export function compareActivation(eyring: EyringFit, barrier: RecordedBarrier): ActivationComparison | undefined {
  if (barrier.basis === 'E') return undefined;
  const t = intervalMultiplier(eyring.fit.dof);
  const c = eyring.fit.covariance;
  const [fitted, se] =
    barrier.basis === 'H'
      ? [eyring.enthalpy.value, eyring.enthalpy.standardError]
      : [
          eyring.enthalpy.value - barrier.T * eyring.entropy.value,
          Math.sqrt(c[1]![1]! + barrier.T ** 2 * c[0]![0]! - 2 * barrier.T * c[0]![1]!),
        ];
  if (!Number.isFinite(fitted) || !Number.isFinite(se)) return undefined;
  const halfWidth = t * se;
  return {
    quantity: barrier.basis === 'H' ? 'ΔH‡' : 'ΔG‡',
    fitted,
    standardError: se,
    halfWidth,
    recorded: barrier.value,
    source: barrier.source,
    agrees: Math.abs(fitted - barrier.value) <= halfWidth,
  };
}

/** The fit/activation warning for a comparison that disagrees, at the observation's data. */
export function activationDiagnostic(
  comparison: ActivationComparison,
  observation: string,
  index: number,
): Diagnostic | undefined {
  if (comparison.agrees) return undefined;
  const kj = (x: number) => (x / 1000).toFixed(1);
  return diagnostic(
    'fit/activation',
    'warning',
    `observation ${observation}: the Eyring fit gives ${comparison.quantity} = ${kj(comparison.fitted)} ± ${kj(comparison.halfWidth)} kJ/mol (95 %), but ${comparison.source} is ${kj(comparison.recorded)} kJ/mol`,
    {
      path: ['observations', index, 'data'],
      actual: comparison.recorded,
      expected: comparison.fitted,
      note: 'check the step energies, or which rate constant the series measures (data: constant)',
    },
  );
}
