import { parseQuantity, quantities, type Quantity } from '@voltcast/core';
import { InputError } from '../exit-codes.ts';

/** What a column of a capture or an envelope holds. */
export type ColumnKind = 'time' | 'voltage' | 'code';

/** ADC codes: plain counts; a unit row may call them codes or LSB. */
const codes: Quantity = { name: 'ADC code', units: ['LSB', 'codes', 'code'] };

const kinds: Readonly<Record<ColumnKind, { readonly quantity: Quantity; readonly hint: string }>> = {
  time: { quantity: quantities.time, hint: 'write s, ms, us or ns (an SI prefix and s), or convert the column to seconds' },
  voltage: { quantity: quantities.voltage, hint: 'write V, mV or uV (an SI prefix and V), or convert the column to volts' },
  code: { quantity: codes, hint: 'this envelope holds ADC codes (envelope-adc-NAME.csv): give the captured codes as plain numbers, or compare volts against envelope.csv' },
};

/** The quantity a value of `kind` is read as (for options such as --margin). */
export function quantityOf(kind: ColumnKind): Quantity {
  return kinds[kind].quantity;
}

/** A header split into name and the unit in brackets: `CH1 (mV)` is CH1 and mV, `Time [s]` Time and s. */
export function splitHeader(header: string): { name: string; unit: string } {
  const match = /^(.*?)\s*[([]\s*([^()[\]]*?)\s*[)\]]$/.exec(header);
  return match !== null && match[1] !== '' ? { name: match[1], unit: match[2] } : { name: header, unit: '' };
}

/**
 * A reader of one column's fields in `unit` (from its header or units row) as SI base units:
 * `1.5` in `ms` is 0.0015 s, the prefix folded into the decimal exponent as circuit files
 * read it. The reader returns undefined for a field that is not a number. A unit that is not
 * one of `kind` is refused here (`where` names the column): never a verdict on numbers read
 * in the wrong unit.
 */
export function numberIn(unit: string, kind: ColumnKind, where: string): (field: string) => number | undefined {
  const { quantity, hint } = kinds[kind];
  const scale = unit === '' ? { value: 1 } : parseQuantity(`1${unit}`, quantity);
  if ('error' in scale || (unit !== '' && !quantity.units.some((symbol) => unit.endsWith(symbol)))) {
    throw new InputError(`${where} is in '${unit}', which is not a unit of ${quantity.name}\n  ${hint}`);
  }
  if (scale.value === 1) {
    // Base units (or none): the fields are plain numbers.
    return (field) => {
      const value = Number(field);
      return field !== '' && Number.isFinite(value) ? value : undefined;
    };
  }
  return (field) => {
    const parsed = parseQuantity(`${field}${unit}`, quantity);
    return 'value' in parsed ? parsed.value : undefined;
  };
}
