import { decodeCandidates, encodeCandidates, type Candidate } from './candidates-url';

describe('candidates in the URL', () => {
  const candidates: Candidate[] = [
    { name: '50 Ω outer layer — µstrip', spec: { kind: 'microstrip', w: 3e-4, h: 1.7e-4, t: 3.48e-5, er: 4.2 } },
    { name: 'Inner layer', spec: { kind: 'stripline', w: 1.2e-4, b: 5e-4, t: 1.74e-5, er: 4.2 } },
  ];

  it('round-trips names (with non-ASCII characters) and specs', () => {
    expect(decodeCandidates(encodeCandidates(candidates))).toEqual(candidates);
  });

  it('drops entries whose spec is not a valid line and ignores garbage', () => {
    const withBad = encodeCandidates([...candidates, { name: 'bad', spec: { kind: 'coax', d: 2e-3, D: 1e-3, er: 2.25 } }]);
    expect(decodeCandidates(withBad).map((candidate) => candidate.name)).toEqual(candidates.map((candidate) => candidate.name));
    expect(decodeCandidates('%%%not-base64')).toEqual([]);
    expect(decodeCandidates(null)).toEqual([]);
  });
});
