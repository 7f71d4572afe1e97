/** Reads a whitespace-separated reference data file of tests/reference/data/ (`#` lines are comments). */
import { readFileSync } from 'node:fs';

/** The numeric rows of a reference data file, in file order. */
export function readReferenceData(name: string): number[][] {
  const text = readFileSync(new URL(`../reference/data/${name}`, import.meta.url), 'utf8');
  return text
    .split(/\r?\n/)
    .filter((line) => line.trim() !== '' && !line.startsWith('#'))
    .map((line) => line.trim().split(/\s+/).map(Number));
}

/** Significant digits two numbers share: the log relative error, as the NIST StRD grades a program. */
export function agreeingDigits(actual: number, certified: number): number {
  if (actual === certified) return 15;
  return -Math.log10(Math.abs(actual - certified) / Math.abs(certified));
}
