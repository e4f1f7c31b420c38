/**
 * Smallest and largest value of each recorded unknown over every accepted step, not only at
 * the output rows: a peak between two rows still counts. Allocation-free per step.
 */
export class Extremes {
  readonly minimum: Float64Array;
  readonly maximum: Float64Array;

  constructor(private readonly unknowns: Int32Array) {
    this.minimum = new Float64Array(unknowns.length).fill(Infinity);
    this.maximum = new Float64Array(unknowns.length).fill(-Infinity);
  }

  add(x: Float64Array): void {
    const { unknowns, minimum, maximum } = this;
    for (let i = 0; i < unknowns.length; i++) {
      const k = unknowns[i];
      // Ground (-1) reads 0.
      const v = k < 0 ? 0 : x[k];
      if (v < minimum[i]) minimum[i] = v;
      if (v > maximum[i]) maximum[i] = v;
    }
  }
}
