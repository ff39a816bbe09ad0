// Reading an analyser's sweep export: a CSV or whitespace-separated text file with a frequency
// column and either SWR, or R and X, or return loss, in any column order, with or without a
// header, frequency in Hz, kHz or MHz. papaparse splits the rows (quotes, delimiters); this
// module finds the table in the file, guesses which column is which and reads the points,
// naming the line of every problem. Pure: it runs in the browser for the preview and on the
// server for the upload, with the same answers.
import Papa from "papaparse";
import { RADIO_REFERENCE_OHMS, swr as swrOfImpedance, swrFromGamma } from "@/lib/antenna/feedline";
import { complex } from "mathjs";

/** What Guyline accepts, stated in the upload form and the README. */
export const SWEEP_LIMITS = {
  /** 1 MiB holds about 20 000 rows of four columns: far more than any analyser exports. */
  maxBytes: 1024 * 1024,
  minPoints: 5,
  maxPoints: 5000,
  /**
   * 1–500 MHz covers every band a plan can have (160 m to 70 cm) and keeps the three units
   * apart by size alone: MHz values run 1–500, kHz values 1 000–500 000, Hz values 10⁶ and up.
   */
  minMHz: 1,
  maxMHz: 500,
} as const;

/** Beyond this an analyser's reading is noise; a total reflection (return loss 0 dB) is kept at it. */
export const SWR_CEILING = 100;
/** Problems listed at most, so a wholly wrong file gets a short answer. */
const MAX_PROBLEMS = 10;

export const FREQUENCY_UNITS = ["Hz", "kHz", "MHz"] as const;
export type FrequencyUnit = (typeof FREQUENCY_UNITS)[number];
const UNITS_PER_MHZ: Record<FrequencyUnit, number> = { Hz: 1e6, kHz: 1e3, MHz: 1 };

export const SWEEP_QUANTITIES = ["swr", "impedance", "return-loss"] as const;
export type SweepQuantity = (typeof SWEEP_QUANTITIES)[number];
export const QUANTITY_LABELS: Record<SweepQuantity, string> = {
  swr: "SWR",
  impedance: "R and X (ohms)",
  "return-loss": "Return loss (dB)",
};

/** Which column holds what (0-based column indexes); null for a quantity the file does not give. */
export interface SweepMapping {
  frequencyColumn: number;
  frequencyUnit: FrequencyUnit;
  quantity: SweepQuantity;
  swrColumn: number | null;
  rColumn: number | null;
  xColumn: number | null;
  returnLossColumn: number | null;
}

/** One measured frequency: SWR against the analyser's 50 Ω, and R and X when the file gives them. */
export interface MeasuredPoint {
  mhz: number;
  swr: number;
  r?: number;
  x?: number;
}

export interface SweepProblem {
  /** The file's line (the first line is 1), or null for the file as a whole. */
  line: number | null;
  message: string;
}

export const problemText = (problem: SweepProblem) => (problem.line === null ? problem.message : `line ${problem.line}: ${problem.message}`);

export interface SweepColumn {
  index: number;
  /** The header's name for it, when the file has a header. */
  name: string | null;
}

export interface SweepTable {
  columns: SweepColumn[];
  /** The line of the header, if any. */
  headerLine: number | null;
  rows: { line: number; values: number[] }[];
  delimiter: "comma" | "semicolon" | "tab" | "whitespace";
  decimalComma: boolean;
}

type Reading<T> = { ok: true; value: T } | { ok: false; problems: SweepProblem[] };

/**
 * The file's text: UTF-8, or Windows-1252 when it is not valid UTF-8 (older exports write
 * "Ω" that way). A byte order mark is dropped; NUL or other control bytes mean binary data.
 */
export function decodeSweepFile(bytes: Uint8Array): Reading<string> {
  if (bytes.length === 0) return { ok: false, problems: [{ line: null, message: "The file is empty." }] };
  if (bytes.length > SWEEP_LIMITS.maxBytes) {
    return { ok: false, problems: [{ line: null, message: `The file is ${(bytes.length / 1024 / 1024).toFixed(1)} MB; a sweep file may be at most 1 MB.` }] };
  }
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    text = new TextDecoder("windows-1252").decode(bytes);
  }
  // The WHATWG MIME Sniffing Standard's binary data bytes, as the stored-files check uses.
  const binary = text.search(/[\u0000-\u0008\u000b\u000e-\u001a\u001c-\u001f]/);
  if (binary >= 0) {
    return { ok: false, problems: [{ line: lineAt(text, binary), message: "this is not a text file: it holds binary data. Export the sweep as CSV or text." }] };
  }
  return { ok: true, value: text };
}

function lineAt(text: string, offset: number): number {
  let line = 1;
  for (let index = 0; index < offset; index++) if (text.charCodeAt(index) === 10) line++;
  return line;
}

const isComment = (line: string) => /^\s*(#|!|\/\/)/.test(line);

/** A number as analysers write it: 7.05, -3.2, 7.05E+06, and 7,05 where the comma is the decimal mark. */
export function readNumber(cell: string, decimalComma: boolean): number | null {
  const text = cell.trim();
  const pattern = decimalComma ? /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/ : /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
  if (!pattern.test(text)) return null;
  return Number(decimalComma ? text.replace(",", ".") : text);
}

/** Tab, semicolon or comma when the rows use one; otherwise runs of spaces. A comma between digits is a decimal mark when something else separates the columns. */
function chooseDelimiter(lines: string[]): { delimiter: SweepTable["delimiter"]; decimalComma: boolean } {
  const sample = lines.filter((line) => line.trim() !== "" && !isComment(line)).slice(0, 50);
  const decimalCommas = sample.some((line) => /\d,\d/.test(line));
  if (sample.some((line) => line.includes("\t"))) return { delimiter: "tab", decimalComma: decimalCommas };
  if (sample.some((line) => line.includes(";"))) return { delimiter: "semicolon", decimalComma: decimalCommas };
  if (sample.some((line) => line.includes(","))) {
    // "7,050 1,23": the commas sit inside space-separated numbers.
    const spacedDecimals = sample.every((line) => {
      const tokens = line.trim().split(/\s+/);
      return tokens.length >= 2 && tokens.every((token) => /^[+-]?\d*,\d+$|^[+-]?\d+$/.test(token));
    });
    return spacedDecimals ? { delimiter: "whitespace", decimalComma: true } : { delimiter: "comma", decimalComma: false };
  }
  return { delimiter: "whitespace", decimalComma: false };
}

const DELIMITER_CHARACTERS = { comma: ",", semicolon: ";", tab: "\t", whitespace: "\t" } as const;

/**
 * The table in the file: comment lines (#, !, //) and blank lines skipped; text lines before the
 * first row of numbers are a preamble, the last of them the header; every line after that must be
 * a row of numbers with the same number of columns.
 */
export function readSweepTable(text: string): Reading<SweepTable> {
  const lines = text.replace(/^\uFEFF/, "").split(/\r\n|\n|\r/);
  const { delimiter, decimalComma } = chooseDelimiter(lines);
  // Whitespace-separated columns become tab-separated, line by line, so line numbers stay.
  const source = (delimiter === "whitespace" ? lines.map((line) => line.trim().split(/\s+/).join("\t")) : lines).join("\n");

  const records: { line: number; cells: string[] }[] = [];
  let line = 1;
  let counted = 0;
  Papa.parse<string[]>(source, {
    delimiter: DELIMITER_CHARACTERS[delimiter],
    newline: "\n",
    // Each step's row runs from the previous cursor to this one: count its newlines for the next row's line.
    step: (result) => {
      const start = counted;
      counted = result.meta.cursor;
      const rowLine = line;
      for (let index = start; index < counted; index++) if (source.charCodeAt(index) === 10) line++;
      const cells = result.data.map((cell) => cell.trim());
      while (cells.length > 0 && cells[cells.length - 1] === "") cells.pop();
      if (cells.length === 0 || isComment(cells[0])) return;
      records.push({ line: rowLine, cells });
    },
  });

  const numeric = (cells: string[]) => cells.length >= 2 && cells.every((cell) => readNumber(cell, decimalComma) !== null);
  const first = records.findIndex((record) => numeric(record.cells));
  if (first < 0) {
    return {
      ok: false,
      problems: [{ line: null, message: "No rows of numbers were found: a sweep needs one row per frequency, with the frequency and at least one measured value." }],
    };
  }
  const header = first > 0 ? records[first - 1] : null;
  const width = records[first].cells.length;
  const problems: SweepProblem[] = [];
  const rows: SweepTable["rows"] = [];
  for (const record of records.slice(first)) {
    if (problems.length >= MAX_PROBLEMS) break;
    if (record.cells.length !== width) {
      problems.push({ line: record.line, message: `this row has ${record.cells.length} column${record.cells.length === 1 ? "" : "s"}; the rows above have ${width}.` });
      continue;
    }
    const bad = record.cells.findIndex((cell) => readNumber(cell, decimalComma) === null);
    if (bad >= 0) {
      problems.push({ line: record.line, message: `“${record.cells[bad].slice(0, 40)}” in column ${bad + 1}${columnName(header, bad)} is not a number.` });
      continue;
    }
    rows.push({ line: record.line, values: record.cells.map((cell) => readNumber(cell, decimalComma) as number) });
  }
  if (problems.length > 0) return { ok: false, problems };
  return {
    ok: true,
    value: {
      columns: Array.from({ length: width }, (_, index) => ({ index, name: header?.cells[index] || null })),
      headerLine: header?.line ?? null,
      rows,
      delimiter,
      decimalComma,
    },
  };
}

function columnName(header: { cells: string[] } | null, index: number): string {
  const name = header?.cells[index];
  return name ? ` (${name})` : "";
}

type Role = "frequency" | "swr" | "r" | "x" | "returnLoss";

/** What a header names, from the words analysers and spreadsheets use. Return loss is asked before R, as both may start with "r". */
function roleOfName(name: string): Role | null {
  const text = name.toLowerCase();
  if (/freq|^f\b|^(hz|khz|mhz)$/.test(text)) return "frequency";
  if (/swr/.test(text)) return "swr";
  if (/return|\brl\b|s11|\bdb\b/.test(text)) return "returnLoss";
  if (/^(r|rs|re|real)\b|resist/.test(text)) return "r";
  if (/^(x|xs|im|imag)\b|react/.test(text)) return "x";
  return null;
}

function unitOfName(name: string): FrequencyUnit | null {
  const text = name.toLowerCase();
  if (/mhz/.test(text)) return "MHz";
  if (/khz/.test(text)) return "kHz";
  if (/(^|[^a-z])hz/.test(text)) return "Hz";
  return null;
}

/** By size alone (see SWEEP_LIMITS): the middle value of the column decides. */
export function unitOfValues(values: number[]): FrequencyUnit {
  const middle = [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
  if (middle < 1000) return "MHz";
  if (middle < 1e6) return "kHz";
  return "Hz";
}

/** Where the values have their lowest and highest point: inside the sweep, or at an end. */
function extremes(values: number[]): { minInside: boolean; maxInside: boolean } {
  let low = 0;
  let high = 0;
  values.forEach((value, index) => {
    if (value < values[low]) low = index;
    if (value > values[high]) high = index;
  });
  const inside = (index: number) => index > 0 && index < values.length - 1;
  return { minInside: inside(low), maxInside: inside(high) };
}

/**
 * A column's likely role from its values, for files without a header: reactance changes sign;
 * S11 written in dB is all negative; an SWR curve dips (its lowest point inside the sweep) and
 * never goes below 1; a return-loss curve peaks; what is left positive is resistance.
 */
function roleOfValues(values: number[]): Exclude<Role, "frequency"> {
  const min = Math.min(...values);
  const max = Math.max(...values);
  if (min < 0 && max > 0) return "x";
  if (max <= 0) return "returnLoss";
  const { minInside, maxInside } = extremes(values);
  if (min >= 1 && minInside && !maxInside) return "swr";
  if (maxInside && !minInside) return "returnLoss";
  return "r";
}

const strictlyRising = (values: number[]) => values.every((value, index) => index === 0 || value > values[index - 1]);

export interface DetectedMapping {
  mapping: SweepMapping;
  /** How each part was found, for the preview. */
  notes: string[];
}

/** Guesses the mapping: by the header's names where it has them, otherwise by the values. */
export function detectMapping(table: SweepTable): DetectedMapping {
  const notes: string[] = [];
  const valuesOf = (index: number) => table.rows.map((row) => row.values[index]);
  const roles = new Map<Role, number>();
  for (const column of table.columns) {
    const role = column.name ? roleOfName(column.name) : null;
    if (role && !roles.has(role)) roles.set(role, column.index);
  }
  const namedMeasure = [...roles.keys()].some((role) => role !== "frequency");
  if (roles.size > 0) notes.push("Columns were matched by the header's names.");

  if (!roles.has("frequency")) {
    const rising = table.columns.find((column) => ![...roles.values()].includes(column.index) && strictlyRising(valuesOf(column.index)));
    roles.set("frequency", rising?.index ?? 0);
    notes.push(`The frequency is taken from column ${(rising?.index ?? 0) + 1}, ${rising ? "the first whose values rise on every row" : "the first column"}.`);
  }
  const frequencyColumn = roles.get("frequency") as number;
  const named = table.columns[frequencyColumn].name;
  const namedUnit = named ? unitOfName(named) : null;
  const frequencyUnit = namedUnit ?? unitOfValues(valuesOf(frequencyColumn));
  notes.push(namedUnit ? `The frequency unit, ${namedUnit}, is in the header.` : `The frequency unit, ${frequencyUnit}, was guessed from the size of the values.`);

  // Only when the header names no measured quantity: an unnamed extra column (|Z|, phase) is not guessed into one.
  const guessed: string[] = [];
  for (const column of namedMeasure ? [] : table.columns) {
    if ([...roles.values()].includes(column.index)) continue;
    const role = roleOfValues(valuesOf(column.index));
    if (!roles.has(role)) {
      roles.set(role, column.index);
      guessed.push(`column ${column.index + 1} looks like ${role === "returnLoss" ? "return loss" : role === "swr" ? "SWR" : role.toUpperCase()}`);
    }
  }
  if (guessed.length > 0) notes.push(`From the values: ${guessed.join("; ")}. Check the columns below.`);

  const at = (role: Role) => roles.get(role) ?? null;
  const quantity: SweepQuantity = at("r") !== null && at("x") !== null ? "impedance" : at("swr") !== null ? "swr" : at("returnLoss") !== null ? "return-loss" : "swr";
  const firstOther = table.columns.find((column) => column.index !== frequencyColumn)?.index ?? null;
  return {
    mapping: {
      frequencyColumn,
      frequencyUnit,
      quantity,
      swrColumn: at("swr") ?? (quantity === "swr" ? firstOther : null),
      rColumn: at("r"),
      xColumn: at("x"),
      returnLossColumn: at("returnLoss"),
    },
    notes,
  };
}

/** The columns a mapping reads for its quantity, by their role. */
export function columnsRead(mapping: SweepMapping): { role: string; column: number | null }[] {
  const values =
    mapping.quantity === "swr"
      ? [{ role: "SWR", column: mapping.swrColumn }]
      : mapping.quantity === "impedance"
        ? [
            { role: "R", column: mapping.rColumn },
            { role: "X", column: mapping.xColumn },
          ]
        : [{ role: "return loss", column: mapping.returnLossColumn }];
  return [{ role: "frequency", column: mapping.frequencyColumn }, ...values];
}

const mhzText = (mhz: number) => `${Number(mhz.toPrecision(7))} MHz`;

/** Reads the points with a mapping; every row is checked and every problem names its line. */
export function readPoints(table: SweepTable, mapping: SweepMapping): Reading<MeasuredPoint[]> {
  const problems: SweepProblem[] = [];
  const read = columnsRead(mapping);
  for (const { role, column } of read) {
    if (column === null || column < 0 || column >= table.columns.length) {
      problems.push({ line: null, message: `Choose the column that holds ${role === "frequency" ? "the frequency" : role}: the file has ${table.columns.length} columns.` });
    }
  }
  const used = read.map(({ column }) => column);
  if (problems.length === 0 && new Set(used).size !== used.length) problems.push({ line: null, message: "Each column can hold only one quantity: choose different columns." });
  if (problems.length > 0) return { ok: false, problems };

  if (table.rows.length > SWEEP_LIMITS.maxPoints) {
    return { ok: false, problems: [{ line: table.rows[SWEEP_LIMITS.maxPoints].line, message: `more than ${SWEEP_LIMITS.maxPoints} points; a sweep may have at most ${SWEEP_LIMITS.maxPoints}. Export a coarser step.` }] };
  }
  if (table.rows.length < SWEEP_LIMITS.minPoints) {
    return { ok: false, problems: [{ line: null, message: `The file has ${table.rows.length} row${table.rows.length === 1 ? "" : "s"} of numbers; a sweep needs at least ${SWEEP_LIMITS.minPoints} points.` }] };
  }

  const points: MeasuredPoint[] = [];
  let previous: { mhz: number; line: number } | null = null;
  for (const row of table.rows) {
    if (problems.length >= MAX_PROBLEMS) break;
    const problem = (message: string) => problems.push({ line: row.line, message });
    const mhz = row.values[mapping.frequencyColumn] / UNITS_PER_MHZ[mapping.frequencyUnit];
    if (!(mhz >= SWEEP_LIMITS.minMHz && mhz <= SWEEP_LIMITS.maxMHz)) {
      problem(`the frequency ${row.values[mapping.frequencyColumn]} ${mapping.frequencyUnit} is outside ${SWEEP_LIMITS.minMHz}–${SWEEP_LIMITS.maxMHz} MHz; check the unit.`);
      continue;
    }
    if (previous && !(mhz > previous.mhz)) {
      problem(`the frequency ${mhzText(mhz)} is not above ${mhzText(previous.mhz)} on line ${previous.line}; a sweep goes up in frequency, one row per frequency.`);
      continue;
    }
    previous = { mhz, line: row.line };
    if (mapping.quantity === "swr") {
      const swr = row.values[mapping.swrColumn as number];
      if (!(swr >= 1)) problem(`SWR ${swr} is below 1; an SWR is 1 or more. Is this the SWR column?`);
      else points.push({ mhz, swr });
    } else if (mapping.quantity === "impedance") {
      const r = row.values[mapping.rColumn as number];
      const x = row.values[mapping.xColumn as number];
      if (r < 0) problem(`R ${r} Ω is negative; an antenna's resistance is 0 or more. Is this the R column?`);
      else points.push({ mhz, r, x, swr: Math.min(SWR_CEILING, swrOfImpedance(complex(r, x), RADIO_REFERENCE_OHMS)) });
    } else {
      // Return loss is positive; S11 is often written as its negative, so the sign is dropped.
      const returnLossDb = Math.abs(row.values[mapping.returnLossColumn as number]);
      points.push({ mhz, swr: Math.min(SWR_CEILING, swrFromGamma(10 ** (-returnLossDb / 20))) });
    }
  }
  if (problems.length > 0) return { ok: false, problems };
  return { ok: true, value: points };
}

export interface SweepReading {
  table: SweepTable | null;
  detected: DetectedMapping | null;
  /** The mapping the points were read with: the one given, or the detected one. */
  mapping: SweepMapping | null;
  points: MeasuredPoint[];
  problems: SweepProblem[];
}

/** The whole reading of an uploaded file, with the given mapping or the detected one. */
export function readSweepFile(bytes: Uint8Array, mapping?: SweepMapping): SweepReading {
  const text = decodeSweepFile(bytes);
  if (!text.ok) return { table: null, detected: null, mapping: null, points: [], problems: text.problems };
  return readSweepText(text.value, mapping);
}

export function readSweepText(text: string, mapping?: SweepMapping): SweepReading {
  const table = readSweepTable(text);
  if (!table.ok) return { table: null, detected: null, mapping: null, points: [], problems: table.problems };
  const detected = detectMapping(table.value);
  const used = mapping ?? detected.mapping;
  const points = readPoints(table.value, used);
  return points.ok
    ? { table: table.value, detected, mapping: used, points: points.value, problems: [] }
    : { table: table.value, detected, mapping: used, points: [], problems: points.problems };
}
