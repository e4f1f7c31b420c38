// odex ships TypeScript sources without a declaration entry; the part of its API we use.
declare module 'odex' {
  export class Solver {
    constructor(n: number);
    relativeTolerance: number;
    absoluteTolerance: number;
    maxSteps: number;
    solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], x1: number): { y: number[]; outcome: number };
  }
}
