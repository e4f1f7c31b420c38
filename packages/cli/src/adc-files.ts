import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { formatSI, type AdcReadout } from '@voltcast/core';
import { BufferedWriter } from './buffered-writer.ts';
import { formatValue } from './waveform-csv.ts';
import { InputError } from './exit-codes.ts';

/** Extra forms of the codes `--codes-as` may ask for, besides the CSV that is always written. */
export const codeFormats = ['c-header', 'json'] as const;
export type CodeFormat = (typeof codeFormats)[number];

/** Codes per line of a C array: short enough to read, long enough to keep the file small. */
const codesPerLine = 16;

/** Read `--codes-as c-header,json`; an unknown word is a usage error (exit 2). */
export function parseCodeFormats(text: string): CodeFormat[] {
  const words = text.split(',').map((word) => word.trim()).filter((word) => word !== '');
  for (const word of words) {
    if (!(codeFormats as readonly string[]).includes(word)) {
      throw new InputError(`--codes-as: '${word}' is not a code format; write one or more of ${codeFormats.join(', ')}, separated by commas`);
    }
  }
  return [...new Set(words)] as CodeFormat[];
}

/**
 * Write every converter's codes into `folder`: `adc-NAME.csv` (`index,time,volts,code`,
 * SI units) always, and `adc-NAME.h` (a C header with a const array of the codes, for
 * firmware unit tests) and `adc-NAME.json` when asked. Returns the file names written.
 */
export function writeAdcFiles(folder: string, circuitName: string, readouts: readonly AdcReadout[], formats: readonly CodeFormat[] = []): string[] {
  const names: string[] = [];
  for (const readout of readouts) {
    const base = `adc-${readout.spec.name}`;
    writeCsv(join(folder, `${base}.csv`), readout);
    names.push(`${base}.csv`);
    if (formats.includes('c-header')) {
      writeFileSync(join(folder, `${base}.h`), cHeader(circuitName, readout));
      names.push(`${base}.h`);
    }
    if (formats.includes('json')) {
      writeFileSync(join(folder, `${base}.json`), codesJson(circuitName, readout));
      names.push(`${base}.json`);
    }
  }
  return names;
}

function writeCsv(path: string, { index, time, volts, code }: AdcReadout): void {
  const out = new BufferedWriter(path);
  try {
    out.write('index,time,volts,code\n');
    for (let i = 0; i < code.length; i++) out.write(`${index[i]},${time[i]},${formatValue(volts[i])},${code[i]}\n`);
  } finally {
    out.close();
  }
}

/** A range end: volts, or the node a ratiometric converter follows. */
function rangeEnd(end: number | string): string {
  return typeof end === 'number' ? formatSI(end, 'V') : `v(${end})`;
}

/** One line describing the converter, for the header comment and the JSON. */
function describe(readout: AdcReadout): string {
  const { spec, code, time } = readout;
  const every = 'rate' in spec.times ? `sampled every ${formatSI(1 / spec.times.rate, 's')}` : 'sampled at listed times';
  const averaged = spec.average > 1 ? `, each the average of ${spec.average} samples` : '';
  const span = code.length > 0 ? ` from ${formatSI(time[0], 's')} to ${formatSI(time[code.length - 1], 's')}` : '';
  return `${spec.bits} bits, ${rangeEnd(spec.low)} to ${rangeEnd(spec.high)}, ${spec.coding}; ${code.length} codes${span}, ${every}${averaged}`;
}

/**
 * A C header for firmware unit tests: `ADC_<NAME>_CODE_COUNT` and `adc_<name>_codes[]`, in
 * the smallest standard integer type that holds every code (signed for two's complement).
 */
export function cHeader(circuitName: string, readout: AdcReadout): string {
  const { spec, code } = readout;
  const id = spec.name.replace(/[^A-Za-z0-9]/g, '_');
  const upper = `ADC_${id.toUpperCase()}`;
  const signed = spec.coding === 'twos-complement';
  const width = spec.bits <= 8 ? 8 : spec.bits <= 16 ? 16 : 32;
  const type = `${signed ? 'int' : 'uint'}${width}_t`;
  const rows: string[] = [];
  for (let i = 0; i < code.length; i += codesPerLine) rows.push('  ' + Array.from(code.subarray(i, i + codesPerLine)).join(', ') + ',');
  return [
    `/* Predicted ADC codes: converter ${spec.name} of circuit '${comment(circuitName)}'.`,
    ` * ${describe(readout)}.`,
    ' * Written by voltcast; run it again rather than editing this file. */',
    `#ifndef VOLTCAST_${upper}_H`,
    `#define VOLTCAST_${upper}_H`,
    '',
    '#include <stdint.h>',
    '',
    `#define ${upper}_CODE_COUNT ${code.length}u`,
    '',
    // An empty array is not valid C: keep one placeholder element, the count says 0.
    `static const ${type} adc_${id.toLowerCase()}_codes[${code.length > 0 ? `${upper}_CODE_COUNT` : '1'}] = {`,
    ...(rows.length > 0 ? rows : ['  0,']),
    '};',
    '',
    `#endif /* VOLTCAST_${upper}_H */`,
    '',
  ].join('\n');
}

/** Text safe inside a C comment. */
function comment(text: string): string {
  return text.replace(/\*\//g, '* /');
}

/** The codes as JSON: the converter's settings, then the columns of the CSV as arrays. */
function codesJson(circuitName: string, readout: AdcReadout): string {
  const { spec } = readout;
  const body = {
    circuit: circuitName,
    adc: spec.name,
    description: describe(readout),
    bits: spec.bits,
    range: [spec.low, spec.high],
    coding: spec.coding,
    lsb: readout.report.lsb,
    time: Array.from(readout.time),
    volts: Array.from(readout.volts),
    code: Array.from(readout.code),
  };
  return JSON.stringify(body) + '\n';
}
