import lpModule, { type SolverAPI } from 'javascript-lp-solver';

/**
 * javascript-lp-solver's solver. The package's typings describe its CommonJS
 * build; Node's ESM import gets the solver itself as the default export.
 * Accept either shape.
 */
export const lpSolver = ('Solve' in lpModule ? lpModule : (lpModule as { default: unknown }).default) as SolverAPI;
