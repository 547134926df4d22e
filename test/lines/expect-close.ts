import { expect } from 'chai';

/** Asserts |actual − expected| ≤ relTol·|expected| (absolute relTol when expected is 0), with a readable message. */
export function expectClose(actual: number, expected: number, relTol: number, label = ''): void {
  const scale = expected === 0 ? 1 : Math.abs(expected);
  const error = Math.abs(actual - expected) / scale;
  expect(Number.isFinite(actual), `${label} is not finite: ${actual}`).to.equal(true);
  expect(error, `${label} ${actual} differs from ${expected} by ${error.toExponential(2)} (relative), more than ${relTol}`).to.be.at.most(relTol);
}
