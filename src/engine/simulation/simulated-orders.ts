/**
 * Apparent orders by simulation: each starting concentration scaled by 1.05^±1 and the central
 * log–log slope of the simulated initial rate.
 */
import { rememberedInitialRate } from './remembered-runs.ts';
import { rateProbe, type SimulationBasis, type SimulationSetup } from './simulation-setup.ts';

const PERTURBATION = 1.05;

/** Apparent orders by simulation: central log–log slope over starting concentrations × 1.05^±1. */
export function simulatedOrders(
  basis: SimulationBasis,
  setup: SimulationSetup,
  species: string[],
): Record<string, number> {
  const out: Record<string, number> = {};
  for (const sp of species) {
    const i = setup.model.species.indexOf(sp);
    if (i < 0 || !(setup.y0[i]! > 0)) continue;
    const rates = [PERTURBATION, 1 / PERTURBATION].map((f) => {
      const y0 = Float64Array.from(setup.y0);
      y0[i] = y0[i]! * f;
      // Each run is read at the same fraction of its own largest extent, as the base run is.
      const probe = rateProbe(basis, setup.model.species, y0, setup.held);
      const r = 'missing' in probe ? undefined : rememberedInitialRate(basis.mechanism, setup.model, y0, probe, 'free');
      return r?.status === 'ok' ? r.rate : Number.NaN;
    });
    const slope = Math.log(rates[0]! / rates[1]!) / Math.log(PERTURBATION * PERTURBATION);
    if (Number.isFinite(slope)) out[sp] = Math.round(slope * 1e4) / 1e4;
  }
  return out;
}
