// The gear shelf as CSV: the columns of an export, and reading an import file into item inputs
// with problems per line and field. The same columns go out and come back in, so an export
// edited in a spreadsheet can be imported into another club's shelf.
import Papa from "papaparse";
import { gearItemSchema, type GearItemInput } from "@/validations/gear";

/** CSV header → the item field it fills. */
export const csvColumns = [
  ["label_code", "labelCode"],
  ["name", "name"],
  ["kind", "kind"],
  ["condition", "condition"],
  ["location", "location"],
  ["notes", "notes"],
  ["approval_rule", "approvalRule"],
  ["cable_type", "cableType"],
  ["length_m", "lengthM"],
  ["connector_a", "connectorA"],
  ["connector_b", "connectorB"],
  ["min_mhz", "minMhz"],
  ["max_mhz", "maxMhz"],
  ["battery_checked_on", "batteryCheckedOn"],
  ["calibration_checked_on", "calibrationCheckedOn"],
  ["height_m", "heightM"],
  ["guy_kit", "guyKit"],
  ["transformer_style", "transformerStyle"],
  ["transformer_ratio", "transformerRatio"],
  ["power_rating_w", "powerRatingW"],
] as const;

export type CsvField = (typeof csvColumns)[number][1];
const headerOf = Object.fromEntries(csvColumns.map(([header, field]) => [field, header])) as Record<CsvField, string>;
const fieldOf = new Map<string, CsvField>(csvColumns.map(([header, field]) => [header, field]));
const requiredHeaders = ["label_code", "name", "kind", "condition", "location"];

export const MAX_IMPORT_ROWS = 2000;

export interface ImportProblem {
  /** The line of the file the row starts on (the header is line 1). */
  line: number;
  /** The CSV column, or "" for a problem with the whole row or file. */
  field: string;
  message: string;
}

export interface ImportRow {
  line: number;
  item: GearItemInput;
}

export interface ImportReading {
  rows: ImportRow[];
  problems: ImportProblem[];
}

/** Reads and checks every row; the caller imports only when `problems` is empty. */
export function readGearCsv(text: string): ImportReading {
  const source = text.replace(/^\uFEFF/, "");
  const records: { line: number; cells: string[] }[] = [];
  let rowStart = 0;
  Papa.parse<string[]>(source, {
    delimitersToGuess: [",", ";", "\t"],
    step: (result) => {
      const line = 1 + countNewlines(source, rowStart);
      rowStart = result.meta.cursor;
      const cells = result.data.map((cell) => cell.replace(/\r$/, ""));
      if (cells.every((cell) => cell.trim() === "")) return;
      records.push({ line, cells });
    },
  });

  const problems: ImportProblem[] = [];
  const [header, ...dataRows] = records;
  if (!header) return { rows: [], problems: [{ line: 1, field: "", message: "The file is empty." }] };
  const headers = header.cells.map((cell) => cell.trim().toLowerCase());
  for (const required of requiredHeaders) {
    if (!headers.includes(required)) problems.push({ line: header.line, field: required, message: `The column "${required}" is missing.` });
  }
  headers.forEach((name) => {
    if (name && !fieldOf.has(name)) problems.push({ line: header.line, field: name, message: `"${name}" is not a column Guyline knows.` });
  });
  if (problems.length > 0) return { rows: [], problems };
  if (dataRows.length === 0) return { rows: [], problems: [{ line: header.line, field: "", message: "The file has no items below its header." }] };
  if (dataRows.length > MAX_IMPORT_ROWS) {
    return { rows: [], problems: [{ line: header.line, field: "", message: `Import at most ${MAX_IMPORT_ROWS} items at a time.` }] };
  }

  const rows: ImportRow[] = [];
  const firstLineOfCode = new Map<string, number>();
  for (const record of dataRows) {
    if (record.cells.length !== headers.length) {
      problems.push({ line: record.line, field: "", message: `This row has ${record.cells.length} cells; the header has ${headers.length}.` });
      continue;
    }
    const values: Record<string, string> = {};
    headers.forEach((name, index) => {
      const field = fieldOf.get(name);
      if (field) values[field] = unescapeFormula(record.cells[index].trim());
    });
    // An unknown kind is reported on the kind column rather than as a union failure.
    const parsed = gearItemSchema.safeParse(values);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = typeof issue.path[0] === "string" ? headerOf[issue.path[0] as CsvField] ?? issue.path[0] : "kind";
        problems.push({ line: record.line, field, message: issue.message });
      }
      continue;
    }
    const earlier = firstLineOfCode.get(parsed.data.labelCode);
    if (earlier !== undefined) {
      problems.push({ line: record.line, field: "label_code", message: `The label code ${parsed.data.labelCode} is already used on line ${earlier}.` });
      continue;
    }
    firstLineOfCode.set(parsed.data.labelCode, record.line);
    rows.push({ line: record.line, item: parsed.data });
  }
  return { rows, problems };
}

/** Undoes the quote an export puts before a cell that a spreadsheet would run as a formula. */
const unescapeFormula = (cell: string) => cell.replace(/^'(?=[=+\-@\t\r])/, "");

function countNewlines(text: string, end: number): number {
  let count = 0;
  for (let index = 0; index < end; index++) if (text.charCodeAt(index) === 10) count++;
  return count;
}

/** One CSV file from rows of item fields, with the import's header. */
export function writeGearCsv(items: readonly Partial<Record<CsvField, string | number | null>>[]): string {
  return Papa.unparse(
    {
      fields: csvColumns.map(([header]) => header),
      data: items.map((item) => csvColumns.map(([, field]) => item[field] ?? "")),
    },
    // A cell starting with = + - or @ would run as a formula in a spreadsheet.
    { escapeFormulae: true },
  );
}
