/**
 * Test helper: the species and steps of nonlinear mechanisms that several tests derive, so each
 * is written once. The tests that use them name the published source beside each check.
 */

/** H2 + Br2 (Christiansen–Herzfeld–Polanyi), initiation and termination through a third body M. */
export const HYDROGEN_BROMINE = `species:
  Br•: { role: intermediate }
  H•: { role: intermediate }
  M: { third_body: true }
steps:
  - equation: Br2 + M -> 2 Br• + M
  - equation: Br• + H2 -> HBr + H•
  - equation: H• + Br2 -> HBr + Br•
  - equation: H• + HBr -> H2 + Br•
  - equation: 2 Br• + M -> Br2 + M
`;

/** The Rice–Herzfeld chain of acetaldehyde with the termination given (e.g. `2 CH3• -> C2H6`). */
export const acetaldehyde = (termination: string) => `species:
  CH3•: { role: intermediate }
  CH3CO•: { role: intermediate }
steps:
  - equation: CH3CHO -> CH3• + CHO•
  - equation: CH3• + CH3CHO -> CH4 + CH3CO•
  - equation: CH3CO• -> CH3• + CO
  - equation: ${termination}
`;

/** The Rice–Herzfeld chain of ethane, terminated by H + C2H5. */
export const ETHANE = `species:
  CH3•: { role: intermediate }
  C2H5•: { role: intermediate }
  H•: { role: intermediate }
steps:
  - equation: C2H6 -> 2 CH3•
  - equation: CH3• + C2H6 -> CH4 + C2H5•
  - equation: C2H5• -> C2H4 + H•
  - equation: H• + C2H6 -> H2 + C2H5•
  - equation: H• + C2H5• -> C2H6
`;

/** A catalyst cycle C + S ⇌ CS -> C + P with an off-cycle dimer 2 C ⇌ C2 (labels). */
export const CATALYST_DIMER = `notation: labels
species:
  C: { role: catalyst }
steps:
  - equation: 2 C <=> C2
  - equation: C + S <=> CS
  - equation: CS -> C + P
`;
