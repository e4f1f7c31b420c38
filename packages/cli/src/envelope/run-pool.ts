import { Piscina } from 'piscina';
import { mergeBounds, SimulationError, type EnvelopeBounds, type EnvelopePlan } from '@voltcast/core';
import type { EnvelopeTask, TaskResult } from './task.ts';

/** Slices per worker: enough for an even finish and a lively progress bar. */
const slicesPerWorker = 8;

/**
 * Run the variants of `plan` in `range` (all by default) on `workers` threads and fold them. Workers load the built
 * worker beside the built CLI (dist/worker.js, plain JavaScript, as the CLI is). Slices
 * fold in whatever order they finish: min and max do not care, so the bounds are the same
 * bit for bit for any number of workers.
 */
export async function runOnWorkers(plan: EnvelopePlan, file: string, workers: number, onDone: (variants: number) => void, range: { from: number; end: number } = { from: 0, end: plan.variants }): Promise<EnvelopeBounds> {
  const pool = new Piscina<EnvelopeTask, TaskResult>({
    filename: new URL('./worker.js', import.meta.url).href,
    minThreads: workers,
    maxThreads: workers,
    idleTimeout: 1000,
  });
  const parts: EnvelopeBounds[] = [];
  const size = Math.max(1, Math.ceil((range.end - range.from) / (workers * slicesPerWorker)));
  let done = 0;
  try {
    const slices: Promise<void>[] = [];
    for (let from = range.from; from < range.end; from += size) {
      const end = Math.min(range.end, from + size);
      const task: EnvelopeTask = { file, runs: plan.runs, seed: plan.seed, corners: plan.corners > 0, from, end };
      slices.push(
        pool.run(task).then((result) => {
          if ('failure' in result) {
            const f = result.failure;
            throw new SimulationError(f.message, f.time, f.nodes, f.hint, f.parts);
          }
          parts.push(result.bounds);
          done += end - from;
          onDone(done);
        }),
      );
    }
    await Promise.all(slices);
  } finally {
    await pool.destroy();
  }
  return mergeBounds(parts);
}
