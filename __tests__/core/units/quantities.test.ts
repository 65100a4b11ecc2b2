import { formatQuantity, parseQuantity } from '../../../src/core/units';

const value = (text: string, kind: Parameters<typeof parseQuantity>[1]) => {
  const r = parseQuantity(text, kind);
  if (!r.ok) throw new Error(r.reason);
  return r.value;
};

// SI prefixes: BIPM, The International System of Units (SI), 9th edition (2019), Table 7.
describe('parseQuantity', () => {
  it('reads SI prefixes on the field unit', () => {
    expect(value('500 mA', 'current')).toBeCloseTo(0.5, 12);
    expect(value('1.2kW', 'power')).toBeCloseTo(1200, 9);
    expect(value('35 ms', 'time')).toBeCloseTo(0.035, 12);
    expect(value('47 uF', 'capacitance')).toBeCloseTo(47e-6, 15);
    expect(value('47 µF', 'capacitance')).toBeCloseTo(47e-6, 15);
    expect(value('50 mΩ', 'resistance')).toBeCloseTo(0.05, 12);
    expect(value('2.2 kohm', 'resistance')).toBeCloseTo(2200, 9);
    expect(value('5 cm', 'length')).toBeCloseTo(0.05, 12);
  });

  it('takes a bare number in the field unit, and grams as the mass unit', () => {
    expect(value('24', 'voltage')).toBe(24);
    expect(value('180 g', 'mass')).toBeCloseTo(0.18, 12);
    expect(value('1.5 kg', 'mass')).toBeCloseTo(1.5, 12);
  });

  it('accepts °C/W as K/W (a kelvin and a degree Celsius are the same size of step; SI Brochure §2.3.1)', () => {
    expect(value('0.8 °C/W', 'thermalResistance')).toBe(0.8);
    expect(value('0.8 K/W', 'thermalResistance')).toBe(0.8);
  });

  it('accepts a decimal comma and exponents', () => {
    expect(value('2,5 A', 'current')).toBe(2.5);
    expect(value('1e-3 s', 'time')).toBe(0.001);
  });

  it('says why a text is refused', () => {
    expect(parseQuantity('', 'current')).toEqual({ ok: false, reason: 'is empty' });
    expect(parseQuantity('abc', 'current')).toMatchObject({ ok: false, reason: expect.stringMatching(/not a number/) });
    const wrong = parseQuantity('5 V', 'current');
    expect(wrong).toMatchObject({ ok: false, reason: expect.stringMatching(/"V" is not a unit of current \(use A\)/) });
    expect(parseQuantity('5 xA', 'current').ok).toBe(false);
  });
});

describe('formatQuantity', () => {
  it('picks the prefix that keeps the mantissa between 1 and 1000', () => {
    expect(formatQuantity(0.0125, 'current')).toBe('12.5 mA');
    expect(formatQuantity(1500, 'power')).toBe('1.5 kW');
    expect(formatQuantity(0.8, 'thermalResistance')).toBe('0.8 K/W');
    expect(formatQuantity(0.18, 'mass')).toBe('180 g');
    expect(formatQuantity(Number.NaN, 'power')).toBe('—');
  });

  it('round-trips through parseQuantity', () => {
    for (const v of [3.3e-6, 0.047, 2.5, 12, 4700, 2.2e6]) {
      expect(value(formatQuantity(v, 'resistance', 6), 'resistance')).toBeCloseTo(v, 9);
    }
  });
});
