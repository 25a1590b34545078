/*
 * Lap CSV: the shape Tunefork imports
 *
 *   lap,time
 *   1,32.481
 *   2,1:02.345
 *
 * - One lap per row: a lap number (a whole number, 0 or more) and a lap time, either in seconds
 *   (32.481) or in minutes and seconds (1:02.345, seconds always two digits).
 * - The header row is optional. When present it names the columns `lap` and `time` in any case and
 *   order; other columns are ignored. Without it the first column is the lap, the second the time.
 * - Columns are separated by commas or by semicolons (decided by the first non-blank row). In
 *   semicolon files a decimal comma is accepted too: 1;32,481.
 * - Blank rows are skipped; cells may be wrapped in double quotes.
 * - Row numbers in error messages count every line of the file from 1, header and blank rows
 *   included, so they match what a text editor or spreadsheet shows.
 * - Laps come back sorted by lap number; a repeated lap number is an error on the later row.
 * - At most 200 KB and 2,000 lap rows per file.
 */
import { TrackdayInputError, describeValue, printableExcerpt } from './inputChecks';
import { parseLapTime } from './lapTime';

/** Largest file accepted, in UTF-8 bytes. */
export const LAP_CSV_MAX_BYTES = 200 * 1024;
/** Most lap rows accepted in one file: far beyond any race day, small enough to answer quickly. */
export const LAP_CSV_MAX_ROWS = 2000;

/** One lap read from the file. */
export interface CsvLap {
  lapNumber: number;
  seconds: number;
  /** 1-based line of the file it came from. */
  row: number;
}

/** A row that could not be read; `message` starts with "row N:". */
export interface LapCsvRowError {
  row: number;
  message: string;
}

/** Result of {@link parseLapCsv}: the laps that were read and every row that was not. */
export interface LapCsvImport {
  laps: CsvLap[];
  errors: LapCsvRowError[];
  hasHeader: boolean;
  separator: ',' | ';';
}

interface Columns {
  lap: number;
  time: number;
  /** Cells in the header: a data row with more is misread, most often a decimal comma. */
  count: number;
}

/**
 * Reads a lap CSV of the documented shape. Problems with single rows are returned as `errors`
 * with their row numbers; problems with the whole file (not text, empty, too large, no lap rows)
 * throw a TrackdayInputError with a message for the racer.
 */
export function parseLapCsv(text: string): LapCsvImport {
  if (typeof text !== 'string') {
    throw new TrackdayInputError(`the lap file must be text, got ${describeValue(text)}`);
  }
  if (exceedsUtf8Bytes(text, LAP_CSV_MAX_BYTES)) {
    throw new TrackdayInputError(
      `the lap file is larger than ${LAP_CSV_MAX_BYTES / 1024} KB: split it into smaller files`,
    );
  }
  const lines = text.replace(/^\ufeff/, '').split(/\r\n|\r|\n/);
  const firstIndex = lines.findIndex((line) => line.trim() !== '');
  if (firstIndex < 0) {
    throw new TrackdayInputError('the lap file is empty: expected rows like "1,32.481"');
  }
  const separator = lines[firstIndex].includes(';') ? ';' : ',';
  const columns = headerColumns(splitCells(lines[firstIndex], separator));
  const hasHeader = columns !== null;
  const dataIndices = lines
    .map((line, index) => (line.trim() !== '' && !(hasHeader && index === firstIndex) ? index : -1))
    .filter((index) => index >= 0);
  if (dataIndices.length > LAP_CSV_MAX_ROWS) {
    throw new TrackdayInputError(
      `the lap file has ${dataIndices.length} lap rows; the limit is ${LAP_CSV_MAX_ROWS}: ` +
        'split it into smaller files',
    );
  }
  if (dataIndices.length === 0) {
    throw new TrackdayInputError('the lap file has a header but no lap rows');
  }
  const laps: CsvLap[] = [];
  const errors: LapCsvRowError[] = [];
  const rowOfLap = new Map<number, number>();
  for (const index of dataIndices) {
    const row = index + 1;
    const read = readRow(splitCells(lines[index], separator), columns, separator === ';');
    if (typeof read === 'string') {
      errors.push({ row, message: `row ${row}: ${read}` });
    } else if (rowOfLap.has(read.lapNumber)) {
      const firstRow = rowOfLap.get(read.lapNumber);
      errors.push({ row, message: `row ${row}: lap ${read.lapNumber} appears twice (also row ${firstRow})` });
    } else {
      rowOfLap.set(read.lapNumber, row);
      laps.push({ ...read, row });
    }
  }
  laps.sort((first, second) => first.lapNumber - second.lapNumber);
  return { laps, errors, hasHeader, separator };
}

function splitCells(line: string, separator: string): string[] {
  const cells = line.split(separator).map((cell) => cell.trim().replace(/^"(.*)"$/s, '$1').trim());
  while (cells.length > 0 && cells[cells.length - 1] === '') cells.pop();
  return cells;
}

/** Column positions when the row is our header (`lap` and `time`, once each), otherwise null. */
function headerColumns(cells: string[]): Columns | null {
  const names = cells.map((cell) => cell.toLowerCase());
  const lap = names.indexOf('lap');
  const time = names.indexOf('time');
  const onceEach = names.lastIndexOf('lap') === lap && names.lastIndexOf('time') === time;
  return lap >= 0 && time >= 0 && onceEach ? { lap, time, count: cells.length } : null;
}

/** The lap in a row, or why the row is not one. */
function readRow(
  cells: string[],
  columns: Columns | null,
  decimalComma: boolean,
): { lapNumber: number; seconds: number } | string {
  if (columns === null && cells.length !== 2) {
    return `expected 2 columns (lap, time), found ${cells.length}`;
  }
  if (columns !== null && cells.length > columns.count) {
    return `expected at most ${columns.count} columns as in the header, found ${cells.length}`;
  }
  const lapCell = cells[columns?.lap ?? 0];
  const timeCell = cells[columns?.time ?? 1];
  if (lapCell === undefined || lapCell === '') return 'the lap number is missing';
  if (timeCell === undefined || timeCell === '') return 'the time is missing';
  if (!/^\d{1,6}$/.test(lapCell)) return `lap '${printableExcerpt(lapCell)}' is not a whole lap number`;
  const time = parseLapTime(timeCell, decimalComma);
  if (!time.ok) return `time '${printableExcerpt(timeCell)}' ${time.reason}`;
  return { lapNumber: Number(lapCell), seconds: time.seconds };
}

/**
 * Whether `text` is longer than `limit` bytes in UTF-8. Counted rather than encoded so a huge
 * upload is refused after reading at most `limit` characters, without making an encoded copy.
 */
function exceedsUtf8Bytes(text: string, limit: number): boolean {
  if (text.length > limit) return true;
  let bytes = 0;
  for (let index = 0; index < text.length; index += 1) {
    const code = text.charCodeAt(index);
    // A surrogate pair is 4 bytes in all: 2 counted for each half.
    bytes += code < 0x80 ? 1 : code < 0x800 || (code >= 0xd800 && code <= 0xdfff) ? 2 : 3;
    if (bytes > limit) return true;
  }
  return false;
}
