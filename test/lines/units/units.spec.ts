import { expect } from 'chai';
import { fromSi, LineInputError, parseQuantity, toSi } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const EXACT = 1e-12;

describe('parseQuantity', () => {
  it('reads lengths in mil, mm, um, µm and inches (1 in = 25.4 mm exactly, international inch of 1959)', () => {
    expectClose(parseQuantity('5 mil', 'length'), 127e-6, EXACT, '5 mil');
    expectClose(parseQuantity('0.2 mm', 'length'), 0.2e-3, EXACT, '0.2 mm');
    expectClose(parseQuantity('35 um', 'length'), 35e-6, EXACT, '35 um');
    expectClose(parseQuantity('35 µm', 'length'), 35e-6, EXACT, '35 µm');
    expectClose(parseQuantity('2 in', 'length'), 0.0508, EXACT, '2 in');
  });

  it('reads copper weight as foil thickness: 1 oz = 1.37 mil ≈ 34.8 µm (trade-sheet value, common practice, no source)', () => {
    expectClose(parseQuantity('1 oz', 'length'), 34.798e-6, EXACT, '1 oz');
    expectClose(parseQuantity('0.5oz', 'length'), 17.399e-6, EXACT, '0.5oz');
  });

  it('reads frequencies, conductivity, field strength and counts per length', () => {
    expectClose(parseQuantity('2.4 GHz', 'frequency'), 2.4e9, EXACT, 'GHz');
    expectClose(parseQuantity('5.8e7 S/m', 'conductivity'), 5.8e7, EXACT, 'S/m');
    expectClose(parseQuantity('20 kV/mm', 'electricField'), 20e6, EXACT, 'kV/mm');
    expectClose(parseQuantity('1 /in', 'perLength'), 1 / 0.0254, EXACT, '/in');
  });

  it('takes a bare number as SI', () => {
    expect(parseQuantity('4.3', 'relativePermittivity')).to.equal(4.3);
    expect(parseQuantity('1e-3', 'length')).to.equal(1e-3);
  });

  it('throws LineInputError naming the field for a unit of the wrong kind or unreadable text', () => {
    expect(() => parseQuantity('5 GHz', 'length', 'w')).to.throw(LineInputError).with.property('field', 'w');
    expect(() => parseQuantity('five mil', 'length', 'w')).to.throw(LineInputError);
    expect(() => parseQuantity('', 'length', 'w')).to.throw(LineInputError);
  });
});

describe('toSi and fromSi (mathjs-free table)', () => {
  it('agree with mathjs for every unit of the table', () => {
    for (const unit of ['mm', 'um', 'mil', 'in'] as const) {
      expectClose(toSi(3, unit), parseQuantity(`3 ${unit}`, 'length'), EXACT, unit);
    }
    expectClose(toSi(2.4, 'GHz'), 2.4e9, EXACT, 'GHz');
  });

  it('are inverse to each other', () => {
    expectClose(fromSi(toSi(7.5, 'mil'), 'mil'), 7.5, EXACT, 'mil');
  });

  it('throws LineInputError for an unknown unit', () => {
    expect(() => toSi(1, 'furlong' as 'mm')).to.throw(LineInputError).with.property('field', 'unit');
  });
});
