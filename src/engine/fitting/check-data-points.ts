/**
 * Whether a data set has enough points, and varies what its fit must find: each varied species of
 * an initial-rate table independently of the others (a rank test on the design of the order fit),
 * more than one temperature in a temperature series, more than one time in a time course.
 */
import { diagnostic, type DataTable, type Diagnostic, type SourceSpot } from '../../model/index.ts';
import { fitInitialRateOrders } from './initial-rate-orders.ts';
import type { KineticData } from './kinetic-data.ts';

/** `data/points` and `data/not-identifiable` diagnostics for a data set read from `table`. */
export function checkDataPoints(table: DataTable, data: KineticData): Diagnostic[] {
  const out: Diagnostic[] = [];
  const at = (spot: SourceSpot) => ({ file: spot.file, line: spot.line, column: spot.column });
  const n = table.rows;
  const header = (name: string) => table.columns.find((c) => c.name === name)?.at ?? table.at;
  if (n < 2) {
    out.push(
      diagnostic(
        'data/points',
        'error',
        `${n === 1 ? 'a single point' : 'no point'} cannot be fitted; measure at least two`,
        at(table.at),
      ),
    );
    return out;
  }
  if (data.kind === 'initial_rates') {
    const orders = fitInitialRateOrders({
      species: data.species,
      concentrations: data.concentrations,
      rates: data.rates,
    });
    const varied = orders.orders.length;
    if (varied === 0) {
      const names = data.species.map((s) => `[${s}]`).join(', ');
      out.push(
        diagnostic(
          'data/not-identifiable',
          'error',
          `no concentration varies (${names} are the same in every row), so no order can be found`,
          at(header(data.species[0]!)),
        ),
      );
      return out;
    }
    const entangled = orders.orders.filter((q) => !q.identifiable).map((q) => q.name);
    if (entangled.length > 0)
      out.push(
        diagnostic(
          'data/not-identifiable',
          'error',
          `the concentrations of ${entangled.join(' and ')} vary together, so their orders cannot be told apart; vary each on its own`,
          at(header(entangled[0]!)),
        ),
      );
    else pointsAgainst(out, n, varied + 1, `${varied} order${varied > 1 ? 's' : ''} and k_app`, at(table.at));
    return out;
  }
  const distinct = (xs: readonly number[]) => new Set(xs).size;
  if (data.kind === 'temperature_series') {
    if (distinct(data.T) < 2)
      out.push(
        diagnostic(
          'data/not-identifiable',
          'error',
          'every point is at the same temperature, so no activation energy can be found',
          at(header('T')),
        ),
      );
    else pointsAgainst(out, n, 2, 'an activation energy and a pre-exponential factor', at(table.at));
    return out;
  }
  if (distinct(data.times) < 2)
    out.push(
      diagnostic(
        'data/not-identifiable',
        'error',
        'every point is at the same time, so the time course shows no change',
        at(header('t')),
      ),
    );
  return out;
}

function pointsAgainst(
  out: Diagnostic[],
  points: number,
  parameters: number,
  what: string,
  where: Pick<SourceSpot, 'file' | 'line' | 'column'>,
): void {
  if (points < parameters)
    out.push(diagnostic('data/points', 'error', `${points} points cannot determine ${what}`, where));
  else if (points === parameters)
    out.push(
      diagnostic(
        'data/points',
        'warning',
        `${points} points determine ${what} exactly, leaving no degree of freedom for an uncertainty`,
        where,
      ),
    );
}
