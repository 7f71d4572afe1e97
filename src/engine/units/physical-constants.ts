/**
 * Physical constants. The SI defining constants are exact since the 2019 redefinition
 * (CODATA 2018), so each is kept twice: as an exact rational, for unit factors that must not
 * collect rounding error, and as the nearest double, for numeric work.
 */
import { Rational } from '../exact/rational.ts';

/** Avogadro constant N_A / mol^-1 (exact, CODATA 2018). */
export const AVOGADRO_EXACT = Rational.of(602214076n * 10n ** 15n);
/** Boltzmann constant k_B / J K^-1 (exact, CODATA 2018). */
export const BOLTZMANN_EXACT = Rational.of(1380649n, 10n ** 29n);
/** Planck constant h / J s (exact, CODATA 2018). */
export const PLANCK_EXACT = Rational.of(662607015n, 10n ** 42n);
/** Elementary charge e / C (exact, CODATA 2018). */
export const ELEMENTARY_CHARGE_EXACT = Rational.of(1602176634n, 10n ** 28n);
/** Molar gas constant R = N_A k_B / J mol^-1 K^-1 (exact, as the product of two exact constants). */
export const GAS_CONSTANT_EXACT = AVOGADRO_EXACT.mul(BOLTZMANN_EXACT);
/** Faraday constant F = e N_A / C mol^-1: also the J/mol worth of one eV per particle. */
export const FARADAY_EXACT = ELEMENTARY_CHARGE_EXACT.mul(AVOGADRO_EXACT);
/** Thermochemical calorie / J (exact by definition). */
export const CALORIE_EXACT = Rational.of(4184n, 1000n);
/** Standard atmosphere / Pa (exact by definition). */
export const ATMOSPHERE_EXACT = Rational.of(101325n);
/** Torr / Pa: 1/760 of a standard atmosphere, exactly. */
export const TORR_EXACT = Rational.of(101325n, 760n);

/** N_A / mol^-1. */
export const AVOGADRO = 6.02214076e23;
/** k_B / J K^-1. */
export const BOLTZMANN = 1.380649e-23;
/** h / J s. */
export const PLANCK = 6.62607015e-34;
/** e / C. */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** R / J mol^-1 K^-1, the double nearest the exact product N_A k_B = 8.31446261815324. */
export const GAS_CONSTANT = 8.31446261815324;
/** F / C mol^-1, the double nearest the exact product e N_A = 96485.3321233100184. */
export const FARADAY = 96485.3321233100184;
/** Thermochemical calorie / J. */
export const CALORIE = 4.184;
/** Standard atmosphere / Pa. */
export const ATMOSPHERE = 101325;
