import { csvRecords, previewMaterialsCsv, withServerProblems } from './material-csv';

describe('csvRecords', () => {
  it('reads quoted fields with commas, doubled quotes and CRLF line ends (RFC 4180)', () => {
    expect(csvRecords('name,notes\r\n"Core, A","said ""x"""\r\n')).toEqual([['name', 'notes'], ['Core, A', 'said "x"']]);
  });
});

describe('previewMaterialsCsv', () => {
  it('passes good rows, with SI numbers or unit strings', () => {
    const preview = previewMaterialsCsv('name,dk,df,referenceFrequency\nCore A,4.1,0.015,1 GHz\nCore B,3.6,0.004,1e10\n');
    expect(preview.fileProblems).toEqual([]);
    expect(preview.rows.map((row) => row.problems)).toEqual([[], []]);
  });

  it('names each row\'s problems, counted from 1 after the header as the server counts', () => {
    const preview = previewMaterialsCsv('name,dk,df\n,4.1,0.01\nCore B,"4,2",2\nCore B,4,0\n');
    expect(preview.rows[0].problems).toEqual(['name: required']);
    expect(preview.rows[1].problems).toEqual(['dk: "4,2" is not a number (use a point for decimals)', 'df: must be from 0 to 1']);
    expect(preview.rows[2].problems).toEqual(['name: repeats row 2']);
  });

  it('refuses a header without name and dk, and unknown columns', () => {
    expect(previewMaterialsCsv('title,er\nA,4\n').fileProblems).toHaveLength(2);
  });

  it('merges the server\'s per-row answer into the same rows', () => {
    const preview = withServerProblems(previewMaterialsCsv('name,dk\nGlass-epoxy,4.3\n'), [{ field: 'rows[1].name', detail: 'is already in the catalog' }]);
    expect(preview.rows[0].problems).toEqual(['name: is already in the catalog']);
  });
});
