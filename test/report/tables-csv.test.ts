import { describe, expect, it } from 'vitest';
import { guardCell, reportTablesCsv, tableToCsv } from '../../src/report/tables-csv.ts';
import { markdownTable, type ReportTable } from '../../src/report/tables/report-table.ts';
import { inDisplay } from '../../src/views/display-units.ts';
import { fixture } from './report-fixtures.ts';

/** A minimal CSV reader for the tests (RFC 4180): a byte-order mark, quoted fields, doubled quotes, CR LF lines. */
function readCsv(file: string): string[][] {
  expect(file.startsWith('\uFEFF')).toBe(true);
  expect(file.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
  const csv = file.slice(1).replace(/\r\n/g, '\n');
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < csv.length; i++) {
    const c = csv[i];
    if (quoted) {
      if (c === '"' && csv[i + 1] === '"') ((field += '"'), i++);
      else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') (row.push(field), (field = ''));
    else if (c === '\n') (row.push(field), rows.push(row), (row = []), (field = ''));
    else field += c;
  }
  return rows.filter((r) => r.length > 1 || r[0] !== '');
}

describe('report tables as CSV', () => {
  it("the pieces CSV holds every piece's stress at full precision, in the case's units", () => {
    const r = fixture('two-sided-pump.yaml').results;
    const csv = reportTablesCsv(r).find((t) => t.name === 'pieces')!.csv;
    const [header, ...rows] = readCsv(csv);
    const col = header.indexOf('shear stress (ksi)');
    expect(col).toBeGreaterThan(0);
    const stresses = r.sides.flatMap((s) => s.pieces.map((p) => inDisplay(p.shearStress, 'stress', 'us')));
    expect(rows.map((row) => Number(row[col]))).toEqual(stresses.map((v) => Number(v.toPrecision(15))));
  });

  it('every registered table with something to show is written, with a header and one line per row', () => {
    const r = fixture('sample').results;
    const tables = reportTablesCsv(r);
    // The granulator yields and states no tolerances: the past-yield tables, no uncertainty tables.
    expect(tables.map((t) => t.name)).toEqual(['parts', 'segments', 'sides', 'pieces', 'material', 'past-yield-in-time', 'past-yield-sides', 'past-yield-pieces']);
    expect(readCsv(tables.find((t) => t.name === 'segments')!.csv)).toHaveLength(1 + r.case.shaft.segments.length);
    const elastic = reportTablesCsv(fixture('elastic-fan.yaml').results).map((t) => t.name);
    expect(elastic).toContain('past-yield-sides');
    expect(elastic).not.toContain('past-yield-pieces');
  });

  it('a case with tolerances adds the inputs, percentiles and sensitivity of its uncertainty run', () => {
    const r = fixture('screw-conveyor-jam-us.yaml').results;
    const tables = reportTablesCsv(r);
    expect(tables.map((t) => t.name)).toEqual(expect.arrayContaining(['uncertainty-inputs', 'uncertainty-percentiles', 'uncertainty-sensitivity']));
    const [header, ...rows] = readCsv(tables.find((t) => t.name === 'uncertainty-percentiles')!.csv);
    expect(header).toEqual(['quantity', 'unit', 'single run', '5th percentile', 'median', '95th percentile']);
    const at15 = (v: number) => Number(v.toPrecision(15));
    expect(rows[0].slice(2).map(Number)).toEqual([r.yieldRatio, ...r.uncertainty!.percentiles.yieldRatio].map(at15));
    const ranked = readCsv(tables.find((t) => t.name === 'uncertainty-sensitivity')!.csv).slice(1);
    expect(ranked.map((row) => Number(row[2]))).toEqual(r.uncertainty!.sensitivity.map((s) => at15(s.low)));
  });

  it('text a spreadsheet would run as a formula is written with a leading apostrophe; numbers are not touched', () => {
    expect(guardCell('=HYPERLINK("x")')).toBe('\'=HYPERLINK("x")');
    expect(guardCell('+1')).toBe("'+1");
    expect(guardCell('@SUM')).toBe("'@SUM");
    expect(guardCell('plain - text')).toBe('plain - text');
    expect(guardCell(-2.5)).toBe(-2.5);
    const t: ReportTable = {
      name: 't',
      title: 'T',
      columns: [{ label: 'who' }, { label: 'n', unit: 'mm' }],
      rows: [
        ['=cmd|x', -1.25],
        ['a, "b"\nc', null],
      ],
    };
    expect(readCsv(tableToCsv(t))).toEqual([
      ['who', 'n (mm)'],
      ["'=cmd|x", '-1.25'],
      ['a, "b"\nc', ''],
    ]);
  });

  it('numbers are written at 15 significant digits, without the noise of binary arithmetic, in every table', () => {
    const t: ReportTable = { name: 't', title: 'T', columns: [{ label: 'x' }], rows: [[0.1 + 0.2], [2.9999999999999996], [1e-20 / 3], [-123456789.123456789]] };
    expect(
      readCsv(tableToCsv(t))
        .slice(1)
        .map((r) => r[0]),
    ).toEqual(['0.3', '3', '3.33333333333333e-21', '-123456789.123457']);
    for (const name of ['sample', 'screw-conveyor-jam-us.yaml', 'two-sided-pump.yaml']) {
      for (const table of reportTablesCsv(fixture(name).results)) {
        for (const cell of readCsv(table.csv).slice(1).flat()) {
          if (cell !== '' && Number.isFinite(Number(cell))) expect(cell.replace(/^-|e.*$|\./g, '').replace(/^0+/, '').length, `${table.name}: ${cell}`).toBeLessThanOrEqual(15);
        }
      }
    }
  });

  it("markdownTable rounds numbers to the column's significant figures and escapes text", () => {
    const t: ReportTable = {
      name: 't',
      title: 'T',
      columns: [{ label: 'a|b' }, { label: 'x', unit: 'mm', digits: 4 }, { label: 'y' }],
      rows: [
        ['<b>|</b>', 1234.56, 0.0123456],
        [null, 2, 3],
      ],
    };
    expect(markdownTable(t)).toBe('| a\\|b | x (mm) | y |\n| :--- | ---: | ---: |\n| \\<b>\\|\\</b> | 1235 | 0.0123 |\n| — | 2 | 3 |');
  });
});
