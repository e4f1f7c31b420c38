// odex ships TypeScript sources without a declaration entry; the part of its API we use.
declare module 'odex' {
  /** Called after every accepted step; `interpolate(component, x)` is the dense output within it. */
  export type OutputFunction = (step: number, xOld: number, x: number, y: number[], interpolate: (component: number, x: number) => number) => boolean | void;
  export class Solver {
    constructor(n: number);
    relativeTolerance: number;
    absoluteTolerance: number;
    maxSteps: number;
    denseOutput: boolean;
    solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], x1: number, out?: OutputFunction): { y: number[]; outcome: number };
  }
}
