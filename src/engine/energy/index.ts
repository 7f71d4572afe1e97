/** The energy stage: Eyring constants, the profile of one turnover and the energetic span model. */
export {
  DEFAULT_STANDARD_CONCENTRATION,
  DEFAULT_TEMPERATURE,
  energyConditions,
  type EnergyBasis,
  type EnergyConditions,
} from './conditions.ts';
export { energeticSpan, type SpanInput, type SpanResult } from './energetic-span.ts';
export { energyAnalysis, type EnergyResult } from './energy-analysis.ts';
export {
  eyringRateConstant,
  eyringStepConstants,
  thermalFrequency,
  type EyringInput,
  type StepEyringConstants,
} from './eyring.ts';
export { buildEnergyProfile, type EnergyProfile, type ProfileInput, type ProfileState } from './profile.ts';
export { speciesRecord, walkSpecies, type SpeciesWalk } from './route-species.ts';
export { readStepEnergies, type StepEnergyValues } from './step-energies.ts';
