import type { ReadContext, ValueReader } from '../reading/reader.ts';
import { selectKind } from '../reading/select-kind.ts';
import type { Quantity } from '../units/quantity.ts';
import type { Wave, WaveKind } from './wave.ts';
import { ConstantWave } from './constant.ts';
import { points } from './points.ts';
import { sine } from './sine.ts';
import { square } from './square.ts';
import { triangle } from './triangle.ts';
import { file } from './file.ts';
import { fm } from './fm.ts';
import { chirp } from './chirp.ts';
import { sumOf } from './sum.ts';
import { noise } from './noise.ts';

export type { Wave, WaveKind } from './wave.ts';
export { ConstantWave } from './constant.ts';
export { PiecewiseLinearWave } from './points.ts';
export { SineWave } from './sine.ts';
export { SquareWave } from './square.ts';
export { TriangleWave } from './triangle.ts';

/** Every wave kind, by its YAML key. Adding a kind: one file and one line here. */
export const waveKinds: readonly WaveKind[] = [points, sine, square, triangle, file, fm, chirp, sumOf(readStimulus), noise];

/**
 * A source's value: a plain number (`5`, `3.3V`) is a constant; a map selects a wave by its
 * one kind key (`{ sine: { amplitude: 1, frequency: 1k } }`).
 */
export function readStimulus(main: ValueReader, quantity: Quantity, context: ReadContext): Wave {
  const kind = main.kind();
  if (kind === 'scalar') return new ConstantWave(main.number(quantity));
  if (kind !== 'map') {
    main.fail(`expected a ${quantity.name} or a wave, found ${kind === 'list' ? 'a list' : 'nothing'}`, 'write a number such as 5, or a wave such as { sine: { amplitude: 1, frequency: 1k } }');
    return new ConstantWave(NaN);
  }
  const options = main.map();
  const waveKind = selectKind(options, waveKinds, 'a wave', '{ points: [[0, 0], [1m, 5]] }');
  const wave = waveKind?.read(options.get(waveKind.key)!, options, context, quantity) ?? new ConstantWave(NaN);
  options.finish();
  return wave;
}
