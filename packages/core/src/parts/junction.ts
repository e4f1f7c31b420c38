import { ELEMENTARY_CHARGE, kelvin, thermalVoltage } from '../units/constants.ts';
import type { DiodeParameters } from './diode-presets.ts';

/** Reverse current at the breakdown voltage: `breakdown:` is the reverse voltage at this current. */
export const BREAKDOWN_CURRENT = 1e-3;
/** Conductance across every junction, so that a reverse-biased one never leaves a node with nothing that conducts at DC (common practice). */
const GMIN = 1e-12;
/** Beyond this exponent the exponentials continue along their tangent: finite for any voltage. */
const MAX_EXPONENT = 80;
/** The temperature presets and parameters are stated at, °C. */
const NOMINAL_CELSIUS = 25;

/**
 * A junction at one temperature, as Newton-Raphson sees it: the Shockley equation
 * I = Is·(exp(V/(n·Vt)) − 1) with Vt = kT/q, and with a breakdown voltage BV a reverse branch
 * −Ibv·(exp(−(V + BV)/Vt) − exp(−BV/Vt)) that conducts Ibv = 1 mA at V = −BV and nothing at
 * 0 V. `linearize` limits the junction voltage first (below), so that no exponential of an
 * overshooting iterate ever reaches the matrix.
 */
export class Junction {
  /** Current and conductance at the voltage of the last `linearize`. */
  current = 0;
  conductance = 0;
  private readonly nvt: number;
  private readonly vt: number;
  private readonly is: number;
  private readonly breakdown: number;
  /** Critical voltages of the forward and the breakdown branch (where limiting starts). */
  private readonly critical: number;
  private readonly criticalBreakdown: number;
  /** The breakdown branch's current at 0 V, subtracted so that I(0) = 0. */
  private readonly breakdownAtZero: number;
  private last = 0;

  constructor(p: DiodeParameters, celsius: number) {
    this.vt = thermalVoltage(celsius);
    this.nvt = p.emission * this.vt;
    this.is = saturationCurrentAt(p, celsius);
    this.breakdown = p.breakdown ?? Infinity;
    this.critical = criticalVoltage(this.nvt, this.is);
    this.criticalBreakdown = criticalVoltage(this.vt, BREAKDOWN_CURRENT);
    this.breakdownAtZero = Number.isFinite(this.breakdown) ? Math.exp(-this.breakdown / this.vt) : 0;
  }

  /**
   * Set `current` and `conductance` at junction voltage `v`, limited from the voltage the last
   * call used. Returns the voltage used: when it differs from `v`, the iteration cannot count
   * as converged.
   */
  linearize(v: number): number {
    let u = limitJunction(v, this.last, this.nvt, this.critical);
    if (Number.isFinite(this.breakdown)) {
      const bv = this.breakdown;
      u = -bv - limitJunction(-(u + bv), -(this.last + bv), this.vt, this.criticalBreakdown);
    }
    this.last = u;
    const x = u / this.nvt;
    let i = this.is * (exponential(x) - 1);
    let g = (this.is * exponentialSlope(x)) / this.nvt;
    if (Number.isFinite(this.breakdown)) {
      const w = -(u + this.breakdown) / this.vt;
      i -= BREAKDOWN_CURRENT * (exponential(w) - this.breakdownAtZero);
      g += (BREAKDOWN_CURRENT * exponentialSlope(w)) / this.vt;
    }
    this.current = i + GMIN * u;
    this.conductance = g + GMIN;
    return u;
  }

  /**
   * One-sided shot-noise density of the junction's current at voltage `v`, A²/Hz: the forward
   * and reverse carrier flows, Is·exp(v/nVt) and Is, are independent, so 2q·(I + 2·Is), which
   * is 4kT·g at zero bias for n = 1 (textbook shot noise); a breakdown current adds 2q·|I| as
   * its least (avalanche multiplication makes more; this stays the floor).
   */
  shotNoise(v: number): number {
    let flows = this.is * (exponential(v / this.nvt) + 1);
    if (Number.isFinite(this.breakdown)) flows += BREAKDOWN_CURRENT * Math.abs(exponential(-(v + this.breakdown) / this.vt) - this.breakdownAtZero);
    return 2 * ELEMENTARY_CHARGE * flows;
  }

  /** dI/dV at junction voltage `v`, without limiting: the small-signal conductance at an operating point. */
  slope(v: number): number {
    let g = (this.is * exponentialSlope(v / this.nvt)) / this.nvt;
    if (Number.isFinite(this.breakdown)) g += (BREAKDOWN_CURRENT * exponentialSlope(-(v + this.breakdown) / this.vt)) / this.vt;
    return g + GMIN;
  }
}

/** exp(x), continued along its tangent beyond MAX_EXPONENT. */
function exponential(x: number): number {
  return x <= MAX_EXPONENT ? Math.exp(x) : Math.exp(MAX_EXPONENT) * (1 + x - MAX_EXPONENT);
}

/** The derivative of `exponential`. */
function exponentialSlope(x: number): number {
  return Math.exp(Math.min(x, MAX_EXPONENT));
}

/** Where an exponential of scale `nvt` and prefactor `is` starts to bend sharply: nvt·ln(nvt/(√2·is)). */
function criticalVoltage(nvt: number, is: number): number {
  return nvt * Math.log(nvt / (Math.SQRT2 * is));
}

/**
 * Junction voltage limiting, the published method for exponential junctions: above the
 * critical voltage a Newton step of more than 2·n·Vt is shortened so that the current
 * changes as the voltage's logarithm would have it, not its exponential. Below the critical
 * voltage the step is taken as is.
 */
export function limitJunction(next: number, last: number, nvt: number, critical: number): number {
  if (next <= critical || Math.abs(next - last) <= 2 * nvt) return next;
  if (last > 0) {
    const ratio = 1 + (next - last) / nvt;
    return ratio > 0 ? last + nvt * Math.log(ratio) : critical;
  }
  return nvt * Math.log(next / nvt);
}

/** Is at `celsius` from its value at 25 °C (semiconductor device textbooks; see DiodeParameters). */
export function saturationCurrentAt(p: DiodeParameters, celsius: number): number {
  const ratio = kelvin(celsius) / kelvin(NOMINAL_CELSIUS);
  const nvt = p.emission * thermalVoltage(celsius);
  return p.saturationCurrent * Math.pow(ratio, p.temperatureExponent / p.emission) * Math.exp((p.energyGap / nvt) * (ratio - 1));
}
