import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatSI, parseQuantity, quantities } from '../src/units/index.ts';
import type { Quantity } from '../src/units/index.ts';

const all = Object.values(quantities) as Quantity[];

describe('units, property based', () => {
  it('random text never throws: it parses to a finite number or gives an error with a hint', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 16 }), fc.constantFrom(...all), (text, quantity) => {
        const parsed = parseQuantity(text, quantity);
        if ('value' in parsed) expect(Number.isFinite(parsed.value)).toBe(true);
        else {
          expect(parsed.error).toContain(`'${text}'`);
          expect(parsed.hint).toMatch(/^write a number/);
        }
      }),
      { numRuns: 2000 },
    );
  });

  it('formatted numbers read back to the same value within 1e-9 relative', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e12, max: 1e12, noNaN: true, noDefaultInfinity: true }).filter((v) => v === 0 || Math.abs(v) > 1e-18),
        fc.constantFrom(...all),
        (value, quantity) => {
          const text = formatSI(value, quantity.units[0] ?? '', 12);
          const parsed = parseQuantity(text, quantity);
          expect(parsed, text).toHaveProperty('value');
          const back = (parsed as { value: number }).value;
          expect(Math.abs(back - value), text).toBeLessThanOrEqual(1e-9 * Math.abs(value));
        },
      ),
      { numRuns: 2000 },
    );
  });
});
