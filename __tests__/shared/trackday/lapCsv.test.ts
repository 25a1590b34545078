import fc from 'fast-check';
import {
  LAP_CSV_MAX_ROWS,
  TrackdayInputError,
  formatLapTime,
  parseLapCsv,
  parseLapTime,
} from '../../../shared/compute/trackday';

describe('lap CSV: good files', () => {
  it('reads a file with a header and both time forms', () => {
    const result = parseLapCsv('lap,time\n1,32.481\n2,1:02.345\n3,31.9\n');
    expect(result.hasHeader).toBe(true);
    expect(result.separator).toBe(',');
    expect(result.errors).toEqual([]);
    expect(result.laps).toEqual([
      { lapNumber: 1, seconds: 32.481, row: 2 },
      { lapNumber: 2, seconds: 62.345, row: 3 },
      { lapNumber: 3, seconds: 31.9, row: 4 },
    ]);
  });

  it('reads a file without a header', () => {
    const result = parseLapCsv('1,32.481\r\n2,33.102\r\n');
    expect(result.hasHeader).toBe(false);
    expect(result.laps.map((lap) => lap.seconds)).toEqual([32.481, 33.102]);
    expect(result.laps[0].row).toBe(1);
  });

  it('reads semicolons, decimal commas, any header case and any column order', () => {
    const result = parseLapCsv('\ufeffTIME;Lap;Note\n32,481;1;fine\n"1:02.345";"2";\n');
    expect(result.separator).toBe(';');
    expect(result.errors).toEqual([]);
    expect(result.laps).toEqual([
      { lapNumber: 1, seconds: 32.481, row: 2 },
      { lapNumber: 2, seconds: 62.345, row: 3 },
    ]);
  });

  it('skips blank rows but counts them in row numbers, and sorts laps by lap number', () => {
    const result = parseLapCsv('lap,time\n\n3,31.5\n\n1,32.0\n2,31.7');
    expect(result.laps.map((lap) => [lap.lapNumber, lap.row])).toEqual([[1, 5], [2, 6], [3, 3]]);
  });
});

describe('lap CSV: bad rows are reported with their row numbers', () => {
  const file = [
    'lap,time', // 1
    '1,32.481', // 2
    '2,1:7x', // 3
    'three,31.2', // 4
    '4,', // 5
    '5,0', // 6
    '6,1:75.000', // 7
    '1,31.0', // 8
    '7,61:00', // 9
    '8,31.9', // 10
  ].join('\n');

  const notALapTime = 'is not a lap time (write seconds like 32.481 or minutes like 1:02.345)';

  it('keeps the good laps and explains each bad row', () => {
    const result = parseLapCsv(file);
    expect(result.laps.map((lap) => lap.lapNumber)).toEqual([1, 8]);
    expect(result.errors).toEqual([
      { row: 3, message: `row 3: time '1:7x' ${notALapTime}` },
      { row: 4, message: "row 4: lap 'three' is not a whole lap number" },
      { row: 5, message: 'row 5: the time is missing' },
      { row: 6, message: "row 6: time '0' is not a lap time: it must be more than 0 s" },
      { row: 7, message: `row 7: time '1:75.000' ${notALapTime}` },
      { row: 8, message: 'row 8: lap 1 appears twice (also row 2)' },
      { row: 9, message: "row 9: time '61:00' is not a lap time: it is longer than 60 minutes" },
    ]);
  });

  it('a decimal comma in a comma-separated file is an error, not a lap of whole seconds', () => {
    expect(parseLapCsv('lap,time\n1,32,481').errors).toEqual([
      { row: 2, message: 'row 2: expected at most 2 columns as in the header, found 3' },
    ]);
  });

  it('without a header a row must have exactly two columns', () => {
    expect(parseLapCsv('1,32.4\n2,32.5,extra').errors).toEqual([
      { row: 2, message: 'row 2: expected 2 columns (lap, time), found 3' },
    ]);
  });
});

describe('lap CSV: whole-file problems throw a clear TrackdayInputError', () => {
  it('refuses a file over 200 KB', () => {
    const huge = 'lap,time\n' + '1,32.481\n'.repeat(30000);
    expect(() => parseLapCsv(huge)).toThrow(TrackdayInputError);
    expect(() => parseLapCsv(huge)).toThrow('the lap file is larger than 200 KB: split it into smaller files');
  });

  it('refuses a file under 200 KB whose multi-byte characters make it larger in UTF-8', () => {
    expect(() => parseLapCsv('€'.repeat(70000))).toThrow('larger than 200 KB');
  });

  it('refuses more than 2,000 lap rows', () => {
    const rows = Array.from({ length: LAP_CSV_MAX_ROWS + 1 }, (_, index) => `${index + 1},31.5`);
    expect(() => parseLapCsv(rows.join('\n'))).toThrow(
      'the lap file has 2001 lap rows; the limit is 2000: split it into smaller files',
    );
    expect(parseLapCsv(rows.slice(1).join('\n')).laps).toHaveLength(LAP_CSV_MAX_ROWS);
  });

  it('refuses an empty file, a header with no rows, and anything that is not text', () => {
    expect(() => parseLapCsv(' \n\n')).toThrow('the lap file is empty');
    expect(() => parseLapCsv('Lap,Time\n')).toThrow('the lap file has a header but no lap rows');
    expect(() => parseLapCsv(42 as unknown as string)).toThrow('the lap file must be text, got 42');
  });
});

describe('lap CSV: naughty strings never throw anything but our clear errors', () => {
  const naughty = [
    '<script>alert(1)</script>',
    "' OR 1=1 --",
    '𝕿𝖊𝖘𝖙',
    '\u0000',
    'NaN',
    'Infinity',
    '-1',
    '1e309',
    '\u202etime',
    '',
  ];
  const nonBlank = naughty.filter((text) => text.trim() !== '');

  it.each(naughty)('as a time cell %p it is a row error, never a lap', (text) => {
    const result = parseLapCsv(`lap,time\n1,31.0\n2,${text}`);
    expect(result.laps).toEqual([{ lapNumber: 1, seconds: 31, row: 2 }]);
    expect(result.errors).toHaveLength(1);
    expect(result.errors[0].message).toMatch(/^row 3: /);
  });

  it('shows control and direction characters escaped in messages', () => {
    expect(parseLapCsv('lap,time\n1,\u0000').errors[0].message).toBe(
      "row 2: time '\\u0000' is not a lap time (write seconds like 32.481 or minutes like 1:02.345)",
    );
  });

  it.each(nonBlank)('as a whole file %p it yields row errors, not a crash', (text) => {
    const result = parseLapCsv(text);
    expect(result.laps).toEqual([]);
    expect(result.errors.length).toBeGreaterThan(0);
  });

  it('any text at all either parses or throws a TrackdayInputError', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 300 }), (text) => {
      try {
        const result = parseLapCsv(text);
        for (const lap of result.laps) expect(lap.seconds).toBeGreaterThan(0);
        for (const error of result.errors) expect(error.message).toMatch(/^row \d+: /);
      } catch (error) {
        expect(error).toBeInstanceOf(TrackdayInputError);
      }
    }));
  });
});

describe('lap times', () => {
  it('reads both forms and refuses signs, exponents and words', () => {
    expect(parseLapTime('32.481')).toEqual({ ok: true, seconds: 32.481 });
    expect(parseLapTime('1:02.345')).toEqual({ ok: true, seconds: 62.345 });
    for (const text of ['-1', '1e309', 'NaN', 'Infinity', '+31', '31.', '.5', '1:7', ' ']) {
      expect(parseLapTime(text).ok).toBe(false);
    }
    expect(() => parseLapTime(31 as unknown as string)).toThrow('a lap time to read must be text, got 31');
  });

  it('formats and reads back any lap time to the thousandth', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 3_600_000 }), (thousandths) => {
      const parsed = parseLapTime(formatLapTime(thousandths / 1000));
      expect(parsed).toEqual({ ok: true, seconds: expect.closeTo(thousandths / 1000, 9) });
    }));
  });

  it('formats under a minute as seconds and from a minute as m:ss.sss', () => {
    expect(formatLapTime(32.4812)).toBe('32.481');
    expect(formatLapTime(62.345)).toBe('1:02.345');
    expect(() => formatLapTime(-1)).toThrow('lap time cannot be negative, got -1');
  });
});
