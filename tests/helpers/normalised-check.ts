/**
 * Test helpers for normalised rate laws: an apparent constant by name (from the normalised form
 * or its trade form), its unit as text, and the trade form evaluated from a formula the test writes.
 */
import type { ApparentConstant } from '../../src/engine/rate-law/apparent-constant.ts';
import type { NormalisedLaw } from '../../src/engine/rate-law/normalised-law.ts';

/** The apparent constant of that name, failing loudly when the law has none. */
export function constantNamed(law: NormalisedLaw, name: string): ApparentConstant {
  const found = [...law.constants, ...(law.trade?.constants ?? [])].find((c) => c.name === name);
  if (!found)
    throw new Error(
      `no constant ${name}: ${[...law.constants, ...(law.trade?.constants ?? [])].map((c) => c.name).join(', ')}`,
    );
  return found;
}

/** The unit as the report writes it (M and s), e.g. `M^-1 s^-1`. */
export function unitOf(c: ApparentConstant): string {
  return c.unitText;
}

/** The values of the named constants at a point of elementary constants and concentrations. */
export function namedValues(law: NormalisedLaw, point: ReadonlyMap<string, number>): (name: string) => number {
  return (name) => constantNamed(law, name).definition.evaluate(point);
}
