/**
 * Reading the charge written at the end of a formula. The notations and the one ambiguity
 * (`Fe3+` vs `NH4+`) are documented in formula.ts; the digits-or-charge choice is made in
 * formula-body.ts, which leaves the digits here when they are the charge.
 */
import {
  Reader,
  digitFamily,
  isAnyDigit,
  isSign,
  readDigits,
  signOf,
  startsChargeSpec,
  unexpectedMessage,
} from './formula-reader.ts';

// charge = "^" spec | "^{" spec "}" | "{" spec "}" | spec
/** Reads a charge (`^2-`, `^{2-}`, `{2-}`, `²⁻`, `+3`, `++`, `-`); undefined after a failure. */
export function readCharge(r: Reader): number | undefined {
  const at = r.pos;
  if (r.peek() === '^') {
    r.pos++;
    if (r.peek() !== '{' && !startsChargeSpec(r.peek())) return r.fail("expected a charge after '^'", at);
  }
  if (r.peek() !== '{') return readChargeSpec(r);
  const braceAt = r.pos;
  r.pos++;
  const charge = readChargeSpec(r);
  if (charge === undefined) return undefined;
  if (r.peek() === '') return r.fail("unclosed '{'", braceAt);
  if (r.peek() !== '}') return r.fail(unexpectedMessage(r), r.pos);
  r.pos++;
  return charge;
}

// spec = digits sign | sign digits | sign { same sign }   (ASCII or superscript)
function readChargeSpec(r: Reader): number | undefined {
  const at = r.pos;
  const digits = isAnyDigit(r.peek()) ? readDigits(r, digitFamily(r.peek())) : null;
  if (digits === undefined) return undefined;
  const signAt = r.pos;
  let sign = 0;
  let signs = 0;
  while (isSign(r.peek())) {
    const s = signOf(r.peek());
    if (sign !== 0 && s !== sign) return r.fail('mixed signs in a charge', r.pos);
    sign = s;
    signs++;
    r.pos++;
  }
  if (signs === 0)
    return r.fail(digits === null ? 'expected a charge' : 'a charge needs a sign, as in 2+ or 2-', signAt);
  let magnitude = signs;
  if (digits !== null) {
    if (signs > 1) return r.fail('write a charge as digits and one sign, as in 3+', signAt);
    magnitude = digits;
  } else if (signs === 1 && isAnyDigit(r.peek())) {
    const after = readDigits(r, digitFamily(r.peek()));
    if (after === undefined) return undefined;
    magnitude = after;
  }
  if (magnitude === 0) return r.fail('a charge of 0 is written by leaving it out', at);
  return sign * magnitude;
}
