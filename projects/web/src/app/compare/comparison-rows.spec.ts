import { calculate } from '@linewright/lines';
import { comparisonRows } from './comparison-rows';

describe('comparisonRows', () => {
  const narrow = calculate({ kind: 'microstrip', w: 2e-4, h: 1.7e-4, t: 3.48e-5, er: 4.2 });
  const wide = calculate({ kind: 'microstrip', w: 4e-4, h: 1.7e-4, t: 3.48e-5, er: 4.2 });

  it('reads each candidate against the first and flags differences of 1 % or more', () => {
    const z0 = comparisonRows([narrow, wide]).find((row) => row.figure.id === 'z0')!;
    expect(z0.cells[0].difference).toBeUndefined();
    expect(z0.cells[1].difference).toBeCloseTo((wide.z0 - narrow.z0) / narrow.z0, 12);
    expect(z0.cells[1].isNotable).toBe(true);
  });

  it('leaves out figures no candidate has, such as the differential impedance of single lines', () => {
    const ids = comparisonRows([narrow, wide]).map((row) => row.figure.id);
    expect(ids).not.toContain('zDiff');
    expect(ids).toContain('erEff');
  });

  it('keeps an invalid candidate as an empty column', () => {
    const rows = comparisonRows([narrow, undefined]);
    expect(rows[0].cells[1].value).toBeUndefined();
  });
});
