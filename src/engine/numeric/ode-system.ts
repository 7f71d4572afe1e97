/** The system of ordinary differential equations the stiff integrator solves. */

/**
 * y' = f(t, y) with its analytic Jacobian ∂f/∂y (row-major, size × size). f may read t, but the
 * method's order assumes ∂f/∂t = 0, as in mass-action kinetics with constant rate constants.
 */
export interface OdeSystem {
  size: number;
  rhs(t: number, y: Float64Array, dydt: Float64Array): void;
  jacobian(t: number, y: Float64Array, J: Float64Array): void;
}
