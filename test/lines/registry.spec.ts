import { expect } from 'chai';
import { calculate, kindFields, kindLabel, LineInputError, lineKinds, validateSpec, type LineKind, type LineSpec } from '../../projects/lines/src/public-api';

/** The kinds named in the public contract (issue 3). */
const CONTRACT_KINDS: LineKind[] = ['coax', 'twin-lead', 'wire-over-ground', 'twisted-pair', 'microstrip', 'embedded-microstrip', 'stripline', 'offset-stripline', 'cpw', 'coupled-microstrip', 'coupled-stripline'];

function defaultSpec(kind: LineKind): LineSpec {
  const spec: Record<string, unknown> = { kind };
  for (const field of kindFields(kind)) if (!field.isOptional) spec[field.name] = field.defaultValue;
  return spec as unknown as LineSpec;
}

describe('kind registry', () => {
  it('offers every kind of the public contract, with a label, fields and at least one method', () => {
    expect(lineKinds.map((entry) => entry.kind)).to.have.members(CONTRACT_KINDS);
    for (const kind of CONTRACT_KINDS) {
      expect(kindLabel(kind)).to.be.a('string').and.not.empty;
      expect(kindFields(kind).map((field) => field.name)).to.include('er');
    }
  });

  it('computes every kind from its default fields, with loss and totals, finite and without warnings', () => {
    for (const kind of CONTRACT_KINDS) {
      const result = calculate({ ...defaultSpec(kind), tanDelta: 0.02, frequency: 1e9, length: 0.1 } as LineSpec);
      for (const key of ['z0', 'erEff', 'delayPerMeter', 'velocityFactor', 'lPerMeter', 'cPerMeter', 'lossDbPerMeter', 'delay', 'lossDb'] as const) {
        expect(Number.isFinite(result[key]), `${kind}.${key}`).to.equal(true);
      }
      expect(result.warnings, kind).to.deep.equal([]);
      expect(result.method.name, kind).to.be.a('string').and.not.empty;
    }
  });

  it('marks lengths so forms can offer mm, mil, µm and oz', () => {
    const width = kindFields('microstrip').find((field) => field.name === 'w')!;
    expect(width.isLength).to.equal(true);
    expect(kindFields('microstrip').find((field) => field.name === 'er')!.isLength).to.equal(false);
  });
});

describe('validateSpec', () => {
  it('throws LineInputError for an unknown kind and an unknown method', () => {
    expect(() => validateSpec({ kind: 'waveguide' } as unknown as LineSpec)).to.throw(LineInputError).with.property('field', 'kind');
    expect(() => validateSpec({ kind: 'toString' } as unknown as LineSpec)).to.throw(LineInputError).with.property('field', 'kind');
    expect(() => validateSpec(null as unknown as LineSpec)).to.throw(LineInputError).with.property('field', 'kind');
    expect(() => validateSpec({ ...defaultSpec('microstrip'), method: 'guess' } as LineSpec)).to.throw(LineInputError).with.property('field', 'method');
  });

  it('throws LineInputError for negative tanDelta, zero frequency, negative length and zero conductivity', () => {
    const base = defaultSpec('microstrip');
    for (const [field, value] of [['tanDelta', -0.01], ['frequency', 0], ['length', -1], ['conductivity', 0]] as const) {
      expect(() => validateSpec({ ...base, [field]: value } as LineSpec), field).to.throw(LineInputError).with.property('field', field);
    }
  });

  it('throws for a missing required geometry field', () => {
    const { w: _omitted, ...rest } = defaultSpec('microstrip') as { w: number };
    expect(() => validateSpec(rest as unknown as LineSpec)).to.throw(LineInputError).with.property('field', 'w');
  });
});
