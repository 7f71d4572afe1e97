/**
 * A derivation as bytes and back, for the derivation cache and for worker threads: Node's own
 * structured serialisation (v8), which keeps Maps, Sets, bigints, shared references and exact
 * doubles, plus the prototypes of the engine's exact values (DERIVATION_CLASSES), which it would
 * lose. A value of any other class, or a function, cannot be stored: encoding throws, and the
 * caller derives instead of storing.
 */
import { deserialize, serialize } from 'node:v8';
import { DERIVATION_CLASSES } from '../engine/index.ts';

const names = Object.keys(DERIVATION_CLASSES);
const prototypes = names.map((n) => DERIVATION_CLASSES[n]!.prototype);
const kindOf = new Map<object, number>(prototypes.map((p, i) => [p, i]));
const plain = new Set<object | null>([Object.prototype, Array.prototype, null]);

interface Stored {
  root: unknown;
  /** every instance of a derivation class in `root`, and its class's name */
  instances: object[];
  classes: string[];
}

/** Encodes a value holding derivation classes; throws on a function or an object of an unknown class. */
export function encodeDerivationValue(value: unknown): Buffer {
  const instances: object[] = [];
  const classes: string[] = [];
  const seen = new Set<object>();
  const stack: unknown[] = [value];
  while (stack.length > 0) {
    const v = stack.pop();
    if (typeof v === 'function') throw new TypeError('a function cannot be stored');
    if (typeof v !== 'object' || v === null || seen.has(v)) continue;
    seen.add(v);
    if (v instanceof Map) {
      for (const [k, x] of v) stack.push(k, x);
      continue;
    }
    if (v instanceof Set) {
      for (const x of v) stack.push(x);
      continue;
    }
    const proto = Object.getPrototypeOf(v) as object | null;
    const kind = kindOf.get(proto!);
    if (kind !== undefined) {
      instances.push(v);
      classes.push(names[kind]!);
    } else if (!plain.has(proto)) throw new TypeError(`a ${proto?.constructor?.name ?? 'strange'} cannot be stored`);
    if (Object.getOwnPropertySymbols(v).length > 0) throw new TypeError('a symbol-keyed property cannot be stored');
    for (const x of Object.values(v)) stack.push(x);
  }
  const stored: Stored = { root: value, instances, classes };
  return serialize(stored);
}

/** Decodes what encodeDerivationValue wrote, restoring the classes; throws on bytes it cannot read. */
export function decodeDerivationValue(bytes: Uint8Array): unknown {
  const stored = deserialize(bytes) as Stored;
  if (!stored || !Array.isArray(stored.instances) || !Array.isArray(stored.classes))
    throw new TypeError('not a stored derivation');
  stored.instances.forEach((instance, i) => {
    const proto = DERIVATION_CLASSES[stored.classes[i]!]?.prototype;
    if (!proto || typeof instance !== 'object') throw new TypeError('a stored derivation of an unknown class');
    Object.setPrototypeOf(instance, proto);
  });
  return stored.root;
}
