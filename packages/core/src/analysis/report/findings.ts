import type { Circuit } from '../../circuit/circuit.ts';
import type { OpampSpec } from '../../parts/opamp.ts';
import type { StepObserver } from '../../transient/observer.ts';
import type { TransientResult } from '../../transient/result.ts';
import type { AdcReport } from '../adc/adc-report.ts';
import type { ReportWarning } from '../ringing/types.ts';
import { RingingWatch } from '../ringing/ringing-watch.ts';
import { TwoStepGuard } from '../ringing/two-step-guard.ts';
import { SaturationTracker } from '../saturation/saturation-tracker.ts';
import { ampDriving, ringingHint, saturationHint } from './hints.ts';
import { stageShape } from './stage-shape.ts';
import { FINDINGS_SCHEMA, type Findings, type FindingsOptions } from './types.ts';

/**
 * The saturation and ringing analyses of one run. Hand `observers` to `simulate`; after the
 * run, `finish` turns what they saw into `Findings`. Nodes examined for ringing are the
 * recorded and every op-amp output, read at the output rows by an observer of their own, so
 * the analysis works when the run keeps no columns; it holds only bounded windows of rows
 * after events (stimulus corners, and rail exits as the saturation tracker finds them).
 */
export class FindingsWatch {
  readonly observers: readonly StepObserver[];
  private readonly saturation: SaturationTracker;
  private readonly ringing: RingingWatch;
  private readonly guard: TwoStepGuard;
  private readonly nodes: string[];

  constructor(
    private readonly circuit: Circuit,
    private readonly options: FindingsOptions = {},
  ) {
    const outputs = this.amps().map((a) => a.pins.find((p) => p.pin === 'out')!.node);
    this.nodes = [...new Set([...circuit.recorded, ...outputs])].filter((n) => n !== 'gnd');
    this.saturation = new SaturationTracker(circuit, options, (part, time) => this.ringing.event({ time, cause: `${part} left a rail` }));
    // After the tracker, which tells a rail exit once a merge gap has passed.
    this.ringing = new RingingWatch(circuit, this.nodes, options, this.saturation.exitDelay);
    this.guard = new TwoStepGuard(this.nodes);
    this.observers = [this.saturation, this.ringing, this.guard];
  }

  /** `early`: the warnings found before the run started (see startWarnings). */
  finish(transient: TransientResult, adc: readonly AdcReport[] = [], early: readonly ReportWarning[] = []): Findings {
    const { circuit } = this;
    const found = this.saturation.results();
    const shapes = new Map(this.amps().map((a) => [a.name, { amp: a, shape: stageShape(circuit, a) }] as const));
    const saturation = found.saturation.map((interval) => {
      const stage = shapes.get(interval.part)!.shape;
      const noiseGain = 'noiseGain' in stage ? stage.noiseGain : undefined;
      const withOverdrive = noiseGain !== undefined ? { ...interval, overdrive: interval.worstInputError * noiseGain } : interval;
      const hint = saturationHint(withOverdrive, stage);
      return hint ? { ...withOverdrive, hint } : withOverdrive;
    });
    const { ringing, warnings, events: clusters } = this.ringing.finish();
    const hinted = ringing.map((finding) => {
      const amp = ampDriving(circuit, finding.node);
      const hint = amp ? ringingHint(finding, amp, shapes.get(amp.name)!.shape) : undefined;
      return hint ? { ...finding, hint } : finding;
    });
    const allWarnings = [...early, ...this.guard.warnings(), ...warnings].sort((a, b) => (a.time ?? 0) - (b.time ?? 0));
    return {
      schema: FINDINGS_SCHEMA,
      saturation,
      slew: found.slew,
      currentLimit: found.currentLimit,
      ringing: hinted,
      adc,
      warnings: allWarnings,
      stats: {
        ...transient.stats,
        rows: this.ringing.rows,
        events: clusters,
        nodes: this.nodes,
      },
    };
  }

  /** Wall time spent examining ringing windows during the run so far, seconds. */
  get examineSeconds(): number {
    return this.ringing.examineSeconds;
  }

  private amps(): OpampSpec[] {
    return this.circuit.parts.filter((p): p is OpampSpec => p.kind === 'opamp');
  }
}
