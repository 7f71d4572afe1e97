/**
 * What a formula parses to. Its own module so the parser and the formatter can share the type
 * without importing each other.
 */

export type Phase = 'aq' | 'g' | 'l' | 's';

export interface Composition {
  elements: ReadonlyMap<string, number>;
  charge: number;
  radical: boolean;
  excited: boolean;
  phase?: Phase;
  /** surface sites held, by kind ('' for the plain site `@`): 1 for `@` and `CO@`, 2 for `C2H4@@` */
  sites?: ReadonlyMap<string, number>;
}
