import type { Circuit } from '../../circuit/circuit.ts';
import type { OpampSpec } from '../../parts/opamp.ts';
import type { StepObserver } from '../../transient/observer.ts';
import type { TransientResult } from '../../transient/result.ts';
import type { AdcReport } from '../adc/adc-report.ts';
import { stimulusCorners } from '../ringing/events.ts';
import { findRinging } from '../ringing/find-ringing.ts';
import { RowRecorder } from '../ringing/row-recorder.ts';
import { TwoStepGuard } from '../ringing/two-step-guard.ts';
import type { RingingEvent } from '../ringing/types.ts';
import { SaturationTracker } from '../saturation/saturation-tracker.ts';
import { ampDriving, ringingHint, saturationHint } from './hints.ts';
import { stageShape } from './stage-shape.ts';
import { FINDINGS_SCHEMA, type Findings, type FindingsOptions } from './types.ts';

/**
 * The saturation and ringing analyses of one run. Hand `observers` to `simulate`; after the
 * run, `finish` turns what they saw into `Findings`. Nodes examined for ringing are the
 * recorded and every op-amp output, recorded at the output rows by an observer of their own,
 * so the analysis works when the run keeps no columns.
 */
export class FindingsWatch {
  readonly observers: readonly StepObserver[];
  private readonly saturation: SaturationTracker;
  private readonly recorder: RowRecorder;
  private readonly guard: TwoStepGuard;
  private readonly nodes: string[];

  constructor(
    private readonly circuit: Circuit,
    private readonly options: FindingsOptions = {},
  ) {
    const outputs = this.amps().map((a) => a.pins.find((p) => p.pin === 'out')!.node);
    this.nodes = [...new Set([...circuit.recorded, ...outputs])].filter((n) => n !== 'gnd');
    this.saturation = new SaturationTracker(circuit, options);
    this.recorder = new RowRecorder(circuit, this.nodes);
    this.guard = new TwoStepGuard(this.nodes);
    this.observers = [this.saturation, this.recorder, this.guard];
  }

  finish(transient: TransientResult, adc: readonly AdcReport[] = []): Findings {
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
    const events: RingingEvent[] = [
      ...stimulusCorners(circuit.parts, circuit.simulate.duration),
      ...found.railExits.map((e) => ({ time: e.time, cause: `${e.part} left a rail` })),
    ];
    const outputStep = circuit.simulate.outputStep;
    const { ringing, warnings, events: clusters } = findRinging({ time: this.recorder.time, columns: this.recorder.columns, rows: this.recorder.rows }, events, outputStep, this.options);
    const hinted = ringing.map((finding) => {
      const amp = ampDriving(circuit, finding.node);
      const hint = amp ? ringingHint(finding, amp, shapes.get(amp.name)!.shape) : undefined;
      return hint ? { ...finding, hint } : finding;
    });
    const allWarnings = [...this.guard.warnings(), ...warnings].sort((a, b) => (a.time ?? 0) - (b.time ?? 0));
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
        rows: this.recorder.rows,
        events: clusters,
        nodes: this.nodes,
      },
    };
  }

  private amps(): OpampSpec[] {
    return this.circuit.parts.filter((p): p is OpampSpec => p.kind === 'opamp');
  }
}
