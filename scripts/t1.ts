import { fitNonlinear } from '../src/engine/fitting/index.ts';
import { readReferenceData } from '../tests/helpers/reference-data.ts';
const R = 8.31446261815324, KH = 1.380649e-23 / 6.62607015e-34;
const rows = readReferenceData('lente-dithionate.dat');
const k = rows.map(([k]) => k!), T = rows.map(([, t]) => t! + 273.15);
for (const init of [[100e3, 0], [120e3, 10], [118e3, 5]]) {
const fit = fitNonlinear({ parameters: [{ name: 'H', initial: init[0]! }, { name: 'S', initial: init[1]! }], y: k,
  model: ([H, S]) => T.map((t) => KH * t * Math.exp(S! / R - H! / (R * t))) });
console.log(fit.converged, fit.iterations, fit.relativeOffset, fit.parameters.map(p => [p.value, p.standardError]), fit.issues.map(i=>i.message));
}
