import { expect, it } from 'vitest';
import * as algebra from '../../../src/engine/exact/index.ts';

it('pins the public API of the algebra module', () => {
  expect(Object.keys(algebra).sort()).toEqual([
    'Monomial',
    'Polynomial',
    'RationalFunction',
    'STEADY_STATE_WORK',
    'WorkBudget',
    'compareSymbols',
    'content',
    'defaultSymbolStyle',
    'determinant',
    'divideExact',
    'formatLatex',
    'formatText',
    'integerRoot',
    'monomialContent',
    'orderLimits',
    'primitivePart',
    'rationalPower',
    'solveLinear',
    'solveShared',
  ]);
});
