import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { CSV_WRITE_OPTIONS, guardCell, unguardCell } from '../../server/services/shelf/csv-cells';

// Source: OWASP, "CSV Injection" (owasp.org community page): cells that begin with =, +, -, @, tab (0x09) or
// carriage return (0x0D) are treated as formulas; prefix them with a single quote and wrap every cell in quotes.
// The page also warns that a separator inside a cell can start a new cell, so "x;=1+1" opens as a formula in a
// spreadsheet that splits on ";" (the usual one where the decimal mark is a comma).
describe('CSV formula guard (OWASP CSV Injection)', () => {
  it.each([
    ['=1+1', "'=1+1"],
    ['+1', "'+1"],
    ['-1+2', "'-1+2"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\t=1', "'\t'=1"],
    ['\tplain', "'\tplain"],
    ['\r=1', "'\r'=1"],
    ['\n=1', "'\n'=1"],
    [' =1', "' =1"],
    ['\u200b=1', "'\u200b=1"],
    ['\ufeff=1', "'\ufeff=1"],
    ['\u00a0@x', "'\u00a0@x"],
  ])('neutralises a formula at the start: %j', (raw, written) => {
    expect(guardCell(raw)).toBe(written);
  });

  it.each([
    ['x;=1+1', "x;'=1+1"],
    ['x,=1+1', "x,'=1+1"],
    ['x\t=1+1', "x\t'=1+1"],
    ['x| =1', "x|' =1"],
    ['a;\u200b+1', "a;'\u200b+1"],
    ['Beets\n@cmd', "Beets\n'@cmd"],
    ['x;=1;=2', "x;'=1;'=2"],
  ])('neutralises a formula after a separator: %j', (raw, written) => {
    expect(guardCell(raw)).toBe(written);
  });

  it.each(['Pickled Beets', 'Plum ketchup, spiced', 'Jars 1-4', 'a=b', 'name@example.com', '2026-09-14', ''])(
    'leaves ordinary text alone: %j',
    (raw) => {
      expect(guardCell(raw)).toBe(raw);
    },
  );

  it.each(['=1+1', 'x;=1+1', '\t=1', ' =1', '\u200b=1', 'Beets\n@cmd', 'x;=1;=2', 'Pickled Beets', "it's fine"])(
    'takes the guard off again on import: %j',
    (raw) => {
      expect(unguardCell(guardCell(raw))).toBe(raw);
    },
  );

  it('quotes every cell, so a separator or line break inside one never splits it', () => {
    const csv = Papa.unparse(
      { fields: ['product', 'notes'], data: [[guardCell('Beets'), guardCell('x;=1+1')]] },
      CSV_WRITE_OPTIONS,
    );
    expect(csv).toBe(`"product","notes"\r\n"Beets","x;'=1+1"`);
  });
});
