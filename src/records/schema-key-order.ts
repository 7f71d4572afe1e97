/**
 * The order of fields the record schema gives (schemas/mechanism.schema.json, as DESIGN.md sets
 * out the record): for each mapping of a record, the schema node that describes it, so a
 * formatter can put fields in that order. Maps keyed by the author (species by symbol,
 * concentrations, orders) keep the author's order.
 */
import { recordSchema } from './schema-validator.ts';

/** A JSON Schema node, as much of it as the key order needs. */
export interface SchemaNode {
  $ref?: string;
  properties?: Record<string, SchemaNode>;
  additionalProperties?: SchemaNode | boolean;
  items?: SchemaNode;
  anyOf?: SchemaNode[];
  oneOf?: SchemaNode[];
  allOf?: SchemaNode[];
}

/** The schema of a whole record. */
export const RECORD_SCHEMA = recordSchema as SchemaNode;

/** The node a `$ref` names (`#/$defs/StepEntry`), or the node itself. */
function resolved(node: SchemaNode | undefined): SchemaNode | undefined {
  let at = node;
  for (let hops = 0; at?.$ref !== undefined && hops < 10; hops += 1) {
    const path = at.$ref.replace(/^#\//, '').split('/');
    at = path.reduce<unknown>((n, part) => (n as Record<string, unknown> | undefined)?.[part], recordSchema) as
      SchemaNode | undefined;
  }
  return at;
}

/** The alternative of a schema that describes a mapping (or a list), looking through anyOf, oneOf and allOf. */
function shapeOf(node: SchemaNode | undefined, want: 'map' | 'seq'): SchemaNode | undefined {
  const at = resolved(node);
  if (!at) return undefined;
  if (want === 'map' && (at.properties || typeof at.additionalProperties === 'object')) return at;
  if (want === 'seq' && at.items) return at;
  for (const alt of [...(at.anyOf ?? []), ...(at.oneOf ?? []), ...(at.allOf ?? [])]) {
    const found = shapeOf(alt, want);
    if (found) return found;
  }
  return undefined;
}

/** The schema of a mapping: its fields in order (none where the author's keys are data), and each field's schema. */
export function mappingSchema(node: SchemaNode | undefined): {
  order: readonly string[];
  field(key: string): SchemaNode | undefined;
} {
  const map = shapeOf(node, 'map');
  const properties = map?.properties ?? {};
  const extra = typeof map?.additionalProperties === 'object' ? map.additionalProperties : undefined;
  return {
    order: Object.keys(properties),
    field: (key) => (Object.hasOwn(properties, key) ? properties[key] : extra),
  };
}

/** The schema of a list's items. */
export function itemSchema(node: SchemaNode | undefined): SchemaNode | undefined {
  return shapeOf(node, 'seq')?.items;
}
