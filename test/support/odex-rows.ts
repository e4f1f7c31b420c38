import { createRequire } from 'node:module';

// tsconfig maps the name `odex` to its declaration (test/support/odex.d.ts) for the type
// checker, and tsx follows that map at run time; the package's file itself is loaded here.
const odexFile = 'odex/src/odex.js';
const { Solver } = createRequire(import.meta.url)(odexFile) as typeof import('odex');

/** A system of ODEs for odex, y' = f(t, y), and the node value the bench compares. */
export interface OdeCase {
  readonly initial: readonly number[];
  /** `from` is the start of the drive's current piece (the last corner). */
  readonly derivative: (t: number, y: number[], from: number) => number[];
  /** The compared output from the state. */
  readonly output: (t: number, y: readonly number[]) => number;
  /** Times where the drive has a corner: the integration restarts there. */
  readonly corners: readonly number[];
}

/**
 * Integrates an OdeCase with odex (Hairer and Wanner's extrapolation integrator, an
 * independent library from the npm registry) onto the rows k·step, k = 0..rows-1, using its
 * dense output between steps and restarting at every corner of the drive, as a careful user
 * of a general-purpose integrator would. Returns the output at every row and odex's
 * derivative evaluations.
 */
export function odexRows(ode: OdeCase, step: number, rows: number, relative: number, absolute: number): { values: Float64Array; evaluations: number } {
  const values = new Float64Array(rows);
  const end = (rows - 1) * step;
  const stops = [...ode.corners.filter((c) => c > 0 && c < end), end];
  let evaluations = 0;
  const solver = new Solver(ode.initial.length);
  solver.denseOutput = true;
  solver.relativeTolerance = relative;
  solver.absoluteTolerance = absolute;
  solver.maxSteps = 1e8;
  let y = [...ode.initial];
  values[0] = ode.output(0, y);
  let row = 1;
  let from = 0;
  const point = new Array<number>(y.length);
  for (const to of stops) {
    const segmentStart = from;
    const counted = (t: number, y: number[]): number[] => {
      evaluations++;
      return ode.derivative(t, y, segmentStart);
    };
    solver.solve(counted, from, y, to, (_n, _xOld, x, yNow, interpolate) => {
      // Rows inside this step from the dense output; a row on the segment's end from the end state.
      while (row < rows && row * step < to - 1e-15 * end && row * step <= x) {
        for (let i = 0; i < point.length; i++) point[i] = interpolate(i, row * step);
        values[row] = ode.output(row * step, point);
        row++;
      }
      if (x >= to) {
        y = [...yNow];
        while (row < rows && row * step <= to + 1e-15 * end) values[row++] = ode.output(to, y);
      }
    });
    from = to;
  }
  return { values, evaluations };
}
