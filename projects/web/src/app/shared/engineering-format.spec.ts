import { engineering, trimmed } from './engineering-format';

describe('engineering', () => {
  it('picks the SI prefix that keeps the mantissa between 1 and 1000', () => {
    expect(engineering(3.2e-7, 'H/m')).toBe('320 nH/m');
    expect(engineering(1.25e-10, 'F/m')).toBe('125 pF/m');
    expect(engineering(2.4e9, 'Hz')).toBe('2.4 GHz');
    expect(engineering(50, 'Ω')).toBe('50 Ω');
  });

  it('shows zero and non-finite values without a prefix', () => {
    expect(engineering(0, 'Ω')).toBe('0 Ω');
    expect(engineering(Number.NaN, 'Ω')).toBe('—');
  });

  it('rounds to the requested significant digits and drops trailing zeros', () => {
    expect(trimmed(49.9612, 4)).toBe('49.96');
    expect(trimmed(49.99612, 4)).toBe('50');
    expect(trimmed(1.5, 4)).toBe('1.5');
  });
});
