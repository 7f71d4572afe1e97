/**
 * Atom and charge balance of each elementary step, from the species' compositions.
 * Steps with a species of unknown composition are skipped with a note.
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Mechanism, Step } from './mechanism.ts';
import { siteName } from '../notation/formula-sites.ts';

/** Whether a step's atoms and charge balance, or could not be checked (a species without composition). */
export type StepBalance = 'balanced' | 'unbalanced' | 'unchecked';

/** Checks every step's atoms and charge; skipped steps get an info note in `formulas` records. */
export function checkBalance(mechanism: Mechanism): { balance: StepBalance[]; diagnostics: Diagnostic[] } {
  const checked = mechanism.steps.map((step) => checkStepBalance(mechanism, step));
  return { balance: checked.map((c) => c.balance), diagnostics: checked.flatMap((c) => c.diagnostics) };
}

function checkStepBalance(mechanism: Mechanism, step: Step): { balance: StepBalance; diagnostics: Diagnostic[] } {
  const path = ['steps', step.index, 'equation'];
  // A species without composition that nets to nothing in the step (a third body) does not hide an imbalance.
  const unknown = [...step.change.keys()].filter((s) => !mechanism.species.get(s)?.composition);
  if (unknown.length > 0) {
    if (mechanism.notation === 'labels') return { balance: 'unchecked', diagnostics: [] };
    const message = `atoms and charge not checked: ${unknown.join(', ')} ${unknown.length === 1 ? 'has' : 'have'} no composition`;
    return { balance: 'unchecked', diagnostics: [diagnostic('balance/atoms', 'info', message, { path })] };
  }
  const atoms = new Map<string, { left: number; right: number }>();
  const sites = new Map<string, { left: number; right: number }>();
  let leftCharge = 0;
  let rightCharge = 0;
  for (const [side, terms] of [
    ['left', step.reactants],
    ['right', step.products],
  ] as const) {
    for (const term of terms) {
      const composition = mechanism.species.get(term.species)!.composition;
      if (!composition) continue;
      const n = term.coefficient.toNumber();
      for (const [element, count] of composition.elements) {
        const entry = atoms.get(element) ?? { left: 0, right: 0 };
        entry[side] += n * count;
        atoms.set(element, entry);
      }
      for (const [kind, count] of composition.sites ?? []) {
        const entry = sites.get(kind) ?? { left: 0, right: 0 };
        entry[side] += n * count;
        sites.set(kind, entry);
      }
      if (side === 'left') leftCharge += n * composition.charge;
      else rightCharge += n * composition.charge;
    }
  }
  const out: Diagnostic[] = [];
  const unbalanced = [...atoms].filter(([, c]) => c.left !== c.right);
  if (unbalanced.length > 0) {
    const detail = unbalanced.map(([el, c]) => `${el} ${c.left} → ${c.right}`).join(', ');
    out.push(
      diagnostic('balance/atoms', 'error', `atoms do not balance (left → right): ${detail}`, {
        path,
        actual: Object.fromEntries(unbalanced.map(([el, c]) => [el, c.right - c.left])),
      }),
    );
  }
  const siteGap = [...sites].filter(([, c]) => c.left !== c.right);
  if (siteGap.length > 0) {
    const detail = siteGap.map(([kind, c]) => `${siteName(kind)} ${c.left} → ${c.right}`).join(', ');
    out.push(
      diagnostic('balance/sites', 'error', `surface sites do not balance (left → right): ${detail}`, {
        path,
        note: 'a vacant site is written @ and a species on a site CO@; each counts one site',
      }),
    );
  }
  if (leftCharge !== rightCharge) {
    out.push(
      diagnostic(
        'balance/charge',
        'error',
        `charge does not balance: ${signed(leftCharge)} on the left, ${signed(rightCharge)} on the right`,
        {
          path,
          actual: rightCharge,
          expected: leftCharge,
        },
      ),
    );
  }
  return { balance: out.length > 0 ? 'unbalanced' : 'balanced', diagnostics: out };
}

function signed(x: number): string {
  return x > 0 ? `+${x}` : String(x);
}
