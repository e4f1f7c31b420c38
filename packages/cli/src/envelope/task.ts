import type { EnvelopeBounds } from '@voltcast/core';

/** A slice of an envelope's variants for one worker: the plan is rebuilt from the file. */
export interface EnvelopeTask {
  readonly file: string;
  readonly runs: number;
  readonly seed: number;
  readonly corners: boolean;
  readonly from: number;
  readonly end: number;
}

/** A simulation failure, carried across the thread boundary as plain data. */
export interface TaskFailure {
  readonly message: string;
  readonly time: number;
  readonly nodes: readonly string[];
  readonly hint: string;
  readonly parts: readonly string[];
}

export type TaskResult = { readonly bounds: EnvelopeBounds } | { readonly failure: TaskFailure };
