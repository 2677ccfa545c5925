import { describe, expect, it } from 'vitest';
import { parseSurveyCsv, splitCsvLine, type SurveyFraming } from '@/lib/import/survey-csv';

// Framing of a three-span bridge with five girders and 20th points (the demo precast bridge's shape).
const framing: SurveyFraming = { girders: ['G1', 'G2', 'G3', 'G4', 'G5'], spanCount: 3, pointsPerSpan: 20 };

describe('survey CSV cells', () => {
  // RFC 4180 §2: fields may be enclosed in double quotes; a quote inside is written as two quotes.
  it('splits quoted cells with commas and doubled quotes', () => {
    expect(splitCsvLine('"G,1", 2 ,"say ""hi""",4')).toEqual(['G,1', '2', 'say "hi"', '4']);
  });
});

describe('survey CSV rows', () => {
  it('reads a header in any column order and good rows', () => {
    const r = parseSurveyCsv('Elevation,Girder,Point,Span\r\n253.68,G1,10,1\r\n254.22,G1,20,1\r\n', framing);
    expect(r.header).toBe(true);
    expect(r.bad).toBe(0);
    expect(r.good).toBe(2);
    expect(r.rows[0]).toMatchObject({ line: 2, girder: 'G1', span: 1, point: 10 });
    expect(r.rows[0].elevation).toBeCloseTo(253.68, 9);
  });

  it('reads rows without a header in girder, span, point, elevation order, skipping blank and # lines', () => {
    const r = parseSurveyCsv('\uFEFF# surveyed after erection\nG5,2,0,252.8\n\n g5 ,2,1,252.85\n', framing);
    expect(r.header).toBe(false);
    expect(r.rows.map((x) => x.line)).toEqual([2, 4]);
    expect(r.rows[1].girder).toBe('G5'); // case of the name follows the description
    expect(r.bad).toBe(0);
  });

  it('reports every kind of bad row with its line number', () => {
    const text = [
      'girder,span,point,elevation',
      'G9,1,0,250.00', // unknown girder
      'G1,4,0,250.00', // span out of range
      'G1,1,21,250.00', // point out of range
      'G1,1,2,abc', // non-numeric elevation
      'G1,one,2,250', // non-numeric span
      'G1,1,2.5,250', // point not whole
      'G1,1,3,250.1',
      'G1,1,3,250.2', // duplicate of the line before
      'G1,1,4', // missing cell
      'G1,1,5,250.3', // good
    ].join('\n');
    const r = parseSurveyCsv(text, framing);
    const byLine = new Map(r.rows.map((x) => [x.line, x.problems.join(' ')]));
    expect(byLine.get(2)).toMatch(/unknown girder "G9"/i);
    expect(byLine.get(3)).toMatch(/span 4 is out of range \(spans 1 to 3\)/i);
    expect(byLine.get(4)).toMatch(/point 21 is out of range \(points 0 to 20\)/i);
    expect(byLine.get(5)).toMatch(/elevation "abc" is not a number/i);
    expect(byLine.get(6)).toMatch(/span "one" is not a whole number/i);
    expect(byLine.get(7)).toMatch(/point "2.5" is not a whole number/i);
    expect(byLine.get(8)).toBe('');
    expect(byLine.get(9)).toMatch(/duplicate.*line 8/i);
    expect(byLine.get(10)).toMatch(/4 cells|3 cells/);
    expect(byLine.get(11)).toBe('');
    expect(r.good).toBe(2);
    expect(r.bad).toBe(8);
  });

  it('refuses numbers with units or thousands separators rather than guessing', () => {
    const r = parseSurveyCsv('G1,1,0,"1,250.00"\nG1,1,1,250.00ft\nG1,1,2,Infinity\nG1,1,3,1e400', framing);
    expect(r.rows.every((x) => x.problems.some((p) => /elevation/i.test(p)))).toBe(true);
  });

  it('says so when the file holds no rows or a header it cannot read', () => {
    expect(parseSurveyCsv('\n\n', framing).fileProblems[0]).toMatch(/no survey rows/i);
    const odd = parseSurveyCsv('girder,station,offset,elevation\nG1,1,0,250', framing);
    expect(odd.fileProblems[0]).toMatch(/column names/i);
  });
});

describe('survey CSV separators and quoting', () => {
  // RFC 4180 §2 rule 6: fields containing line breaks are enclosed in double quotes. The row after a
  // two-line cell starts two lines further on, as a text editor shows it.
  it('reads a quoted cell that runs over several lines and keeps the line numbers of later rows', () => {
    const text = 'girder,span,point,elevation\n"G1",1,0,250.10\n"G\n1",1,1,250.20\nG1,1,2,250.30\n';
    const r = parseSurveyCsv(text, framing);
    expect(r.delimiter).toBe(',');
    expect(r.rows.map((x) => x.line)).toEqual([2, 3, 5]);
    expect(r.rows[1].problems.join(' ')).toMatch(/unknown girder "G\n1"/i);
    expect(r.rows[2].problems).toEqual([]);
    expect(r.rows[2].elevation).toBeCloseTo(250.3, 9);
  });

  // Common practice: spreadsheets set to a locale with a decimal comma (most of Europe) save "CSV" with
  // semicolons between cells and commas in numbers.
  it('reads semicolon-separated rows with decimal commas and says which separator it found', () => {
    const text = '\uFEFFGirder;Span;Point;Elevation\r\nG1;1;0;76,325\r\nG1;1;1;"76,410"\r\nG2;1;0;76.5\r\n';
    const r = parseSurveyCsv(text, framing);
    expect(r.delimiter).toBe(';');
    expect(r.decimalComma).toBe(true);
    expect(r.header).toBe(true);
    expect(r.bad).toBe(0);
    expect(r.rows.map((x) => x.elevation)).toEqual([76.325, 76.41, 76.5]);
  });

  it('refuses thousands separators in a semicolon file rather than guessing', () => {
    const r = parseSurveyCsv('G1;1;0;1.250,00\nG1;1;1;1,250,00\nG1;1;2;12,5\n', framing);
    expect(r.rows[0].problems.join(' ')).toMatch(/elevation "1\.250,00" is not a number/i);
    expect(r.rows[1].problems.join(' ')).toMatch(/elevation "1,250,00" is not a number/i);
    expect(r.rows[2].problems).toEqual([]);
  });

  it('reads tab-separated rows', () => {
    const r = parseSurveyCsv('G3\t2\t5\t251,75\nG3\t2\t6\t251.80\n', framing);
    expect(r.delimiter).toBe('\t');
    expect(r.rows.map((x) => [x.girder, x.span, x.point, x.elevation])).toEqual([
      ['G3', 2, 5, 251.75],
      ['G3', 2, 6, 251.8],
    ]);
  });

  it('keeps commas as the separator, and decimal commas refused, in a comma file', () => {
    const r = parseSurveyCsv('G1,1,0,"250,5"\n', framing);
    expect(r.delimiter).toBe(',');
    expect(r.decimalComma).toBe(false);
    expect(r.rows[0].problems.join(' ')).toMatch(/elevation "250,5" is not a number/i);
  });

  it('reports a quoted cell that is never closed', () => {
    const r = parseSurveyCsv('G1,1,0,250.1\nG1,1,1,"250.2\nG1,1,2,250.3\n', framing);
    expect(r.rows[1].line).toBe(2);
    expect(r.rows[1].problems.join(' ')).toMatch(/quoted cell is not closed/i);
  });
});
