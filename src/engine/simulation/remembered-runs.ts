/**
 * Initial-rate runs remembered per mechanism, so that no run is made twice: observations with the
 * same starting mixture share their runs (and the runs of their orders), and the concentration
 * series of the site reuses the run the check made for the same observation. The key holds every
 * input of the run (constants, held species, starting concentrations, the probe), so a remembered
 * run is the run that would be made; the mechanism is held weakly, and its runs go with it.
 */
import type { Mechanism } from '../mechanism/mechanism.ts';
import { simulatedInitialRate, type InitialRate, type RateProbe, type ReadingPlacement } from './initial-rate.ts';
import type { MassActionModel } from './mass-action-system.ts';

const runs = new WeakMap<Mechanism, Map<string, InitialRate>>();

/** The initial-rate run of the model from y0, made once per mechanism and inputs. */
export function rememberedInitialRate(
  mechanism: Mechanism,
  model: MassActionModel,
  y0: Float64Array,
  probe: RateProbe,
  placement: ReadingPlacement = 'grid',
): InitialRate {
  let known = runs.get(mechanism);
  if (!known) runs.set(mechanism, (known = new Map()));
  // JSON writes each double so that it reads back to the same double.
  const key = JSON.stringify([model.rates.forward, model.rates.reverse, model.held, Array.from(y0), probe, placement]);
  const remembered = known.get(key);
  if (remembered) return remembered;
  const run = simulatedInitialRate(model, y0, probe, placement);
  known.set(key, run);
  return run;
}
