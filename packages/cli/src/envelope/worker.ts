import { envelopePlan, runVariants, SimulationError, type EnvelopePlan } from '@voltcast/core';
import { readCircuitFile } from '../read-circuit-file.ts';
import type { EnvelopeTask, TaskResult } from './task.ts';

/** The plan of the last task's file and options: a worker usually gets many slices of one. */
let cached: { key: string; plan: EnvelopePlan } | undefined;

/** Run one slice of an envelope in a worker thread (piscina's entry point). */
export default function runSlice(task: EnvelopeTask): TaskResult {
  const key = JSON.stringify([task.file, task.runs, task.seed, task.corners]);
  if (cached?.key !== key) cached = { key, plan: envelopePlan(readCircuitFile(task.file).circuit, task) };
  try {
    return { bounds: runVariants(cached.plan, task.from, task.end) };
  } catch (error) {
    if (!(error instanceof SimulationError)) throw error;
    return { failure: { message: error.message, time: error.time, nodes: error.nodes, hint: error.hint, parts: error.parts } };
  }
}
