// Reading analysers' sweep exports: every supported layout and unit, and malformed files each
// with its line-numbered message. The files are written here by hand in the layouts the trade
// uses (CSV per RFC 4180, semicolons with decimal commas, tabs, runs of spaces); their values
// are invented, the conversions are checked against published relations.
import { describe, expect, it } from "vitest";
import { SWEEP_LIMITS, detectMapping, problemText, readSweepFile, readSweepTable, readSweepText, type SweepMapping } from "@/lib/sweeps/parse";

const encode = (text: string) => new TextEncoder().encode(text);

/** A dipole-like sweep around 7.1 MHz: SWR dips to 1.3 in the middle. */
const FREQS_MHZ = [6.9, 6.95, 7.0, 7.05, 7.1, 7.15, 7.2, 7.25, 7.3];
const SWRS = [3.1, 2.4, 1.8, 1.4, 1.3, 1.5, 1.9, 2.5, 3.2];
const RS = [52, 56, 61, 66, 71, 76, 81, 87, 93];
const XS = [-62, -45, -29, -13, 2, 17, 32, 47, 61];

const rows = (format: (i: number) => string) => FREQS_MHZ.map((_, i) => format(i)).join("\n");

function mappingOf(text: string): SweepMapping {
  const table = readSweepTable(text);
  if (!table.ok) throw new Error(table.problems.map(problemText).join("; "));
  return detectMapping(table.value).mapping;
}

describe("reading sweeps in each layout and unit", () => {
  it("reads a CSV with a header, frequency in MHz and SWR", () => {
    const text = `Freq (MHz),SWR\n${rows((i) => `${FREQS_MHZ[i]},${SWRS[i]}`)}\n`;
    const reading = readSweepText(text);
    expect(reading.problems).toEqual([]);
    expect(reading.mapping).toMatchObject({ frequencyColumn: 0, frequencyUnit: "MHz", quantity: "swr", swrColumn: 1 });
    expect(reading.points).toHaveLength(9);
    expect(reading.points[4]).toEqual({ mhz: 7.1, swr: 1.3 });
  });

  it("reads semicolons with decimal commas, frequency in Hz named in the header, R and X", () => {
    const text = `Frequency [Hz];R;X\n${rows((i) => `${FREQS_MHZ[i] * 1e6};${String(RS[i]).replace(".", ",")},5;${XS[i]},0`)}`;
    const reading = readSweepText(text);
    expect(reading.problems).toEqual([]);
    expect(reading.table?.delimiter).toBe("semicolon");
    expect(reading.table?.decimalComma).toBe(true);
    expect(reading.mapping).toMatchObject({ frequencyUnit: "Hz", quantity: "impedance", rColumn: 1, xColumn: 2 });
    expect(reading.points[0]).toMatchObject({ mhz: 6.9, r: 52.5, x: -62 });
  });

  it("reads tabs with the columns in another order and the frequency in kHz", () => {
    const text = `Xs\tF (kHz)\tRs\n${rows((i) => `${XS[i]}\t${FREQS_MHZ[i] * 1000}\t${RS[i]}`)}`;
    const reading = readSweepText(text);
    expect(reading.problems).toEqual([]);
    expect(reading.mapping).toMatchObject({ frequencyColumn: 1, frequencyUnit: "kHz", quantity: "impedance", rColumn: 2, xColumn: 0 });
    expect(reading.points[8]).toMatchObject({ mhz: 7.3, r: 93, x: 61 });
  });

  it("reads space-separated columns without a header: the rising column is the frequency, the one changing sign is X", () => {
    const text = rows((i) => `  ${FREQS_MHZ[i].toFixed(3)}    ${RS[i]}   ${XS[i]}`);
    const reading = readSweepText(text);
    expect(reading.problems).toEqual([]);
    expect(reading.table?.delimiter).toBe("whitespace");
    expect(reading.table?.columns.every((column) => column.name === null)).toBe(true);
    expect(reading.mapping).toMatchObject({ frequencyColumn: 0, frequencyUnit: "MHz", quantity: "impedance", rColumn: 1, xColumn: 2 });
    expect(reading.detected?.notes.join(" ")).toMatch(/Check the columns/);
  });

  it("tells SWR from return loss without a header: an SWR curve dips, a return-loss curve peaks", () => {
    const swrText = rows((i) => `${FREQS_MHZ[i] * 1e6},${SWRS[i]}`);
    expect(mappingOf(swrText)).toMatchObject({ frequencyUnit: "Hz", quantity: "swr", swrColumn: 1 });
    const returnLoss = SWRS.map((swr) => -20 * Math.log10((swr - 1) / (swr + 1)));
    const rlText = rows((i) => `${FREQS_MHZ[i] * 1000} ${returnLoss[i].toFixed(2)}`);
    expect(mappingOf(rlText)).toMatchObject({ frequencyUnit: "kHz", quantity: "return-loss", returnLossColumn: 1 });
  });

  it("converts return loss to SWR: 9.54 dB is 2.0 and 20.83 dB is 1.2, written as S11 (negative) or as return loss", () => {
    // Source: reference-data.md §4 table (RL = −20·log10|Γ|; SWR 2.0 ↔ 9.54 dB, 1.2 ↔ 20.83 dB), after Pozar, Microwave Engineering §2.3.
    const values = [-3.52, -6.02, -9.54, -20.83, -9.54, -6.02];
    const text = `Freq(MHz),S11(dB)\n${values.map((db, i) => `${7 + i * 0.05},${db}`).join("\n")}`;
    const reading = readSweepText(text);
    expect(reading.mapping).toMatchObject({ quantity: "return-loss", returnLossColumn: 1 });
    expect(reading.points[2].swr).toBeCloseTo(2.0, 2);
    expect(reading.points[3].swr).toBeCloseTo(1.2, 2);
    expect(reading.points[0].swr).toBeCloseTo(5.0, 1);
    const positive = readSweepText(text.replace(/-/g, ""));
    expect(positive.points.map((point) => point.swr)).toEqual(reading.points.map((point) => point.swr));
  });

  it("gives SWR against 50 Ω for R and X: 100 Ω and 25 Ω are both 2:1", () => {
    // Source: reference-data.md §4, Γ = (ZL − Z0)/(ZL + Z0) and SWR = (1 + |Γ|)/(1 − |Γ|) (Pozar, Microwave Engineering §2.3).
    const text = "f,R,X\n7.0,100,0\n7.1,25,0\n7.2,50,0\n7.3,40,30\n7.4,50,50";
    const points = readSweepText(text).points;
    expect(points[0].swr).toBeCloseTo(2, 9);
    expect(points[1].swr).toBeCloseTo(2, 9);
    expect(points[2].swr).toBeCloseTo(1, 9);
    expect(points[3].swr).toBeCloseTo(2, 9); // |Γ| = |−10 + j30| / |90 + j30| = 1/3
  });

  it("skips a preamble, comments and blank lines, and keeps line numbers counting them", () => {
    const text = [
      "# sweep of the forty metre inverted-V",
      "Device: field analyser",
      "",
      "Frequency(MHz),SWR,R,X,|Z|",
      "! calibrated at the connector",
      ...FREQS_MHZ.map((f, i) => `${f},${SWRS[i]},${RS[i]},${XS[i]},${Math.hypot(RS[i], XS[i]).toFixed(1)}`),
      "",
    ].join("\r\n");
    const reading = readSweepText(text);
    expect(reading.problems).toEqual([]);
    expect(reading.table?.headerLine).toBe(4);
    expect(reading.table?.rows[0].line).toBe(6);
    expect(reading.mapping).toMatchObject({ quantity: "impedance", swrColumn: 1, rColumn: 2, xColumn: 3, returnLossColumn: null });
  });

  it("reads quoted CSV fields", () => {
    const text = `"Freq (kHz)","SWR"\n${rows((i) => `"${FREQS_MHZ[i] * 1000}","${SWRS[i]}"`)}`;
    expect(readSweepText(text).points).toHaveLength(9);
  });

  it("reads with a corrected mapping: the same file as SWR instead of the detected R and X", () => {
    const text = `F,A,B\n${rows((i) => `${FREQS_MHZ[i]},${SWRS[i]},${RS[i]}`)}`;
    const corrected: SweepMapping = { frequencyColumn: 0, frequencyUnit: "MHz", quantity: "swr", swrColumn: 1, rColumn: null, xColumn: null, returnLossColumn: null };
    const reading = readSweepText(text, corrected);
    expect(reading.problems).toEqual([]);
    expect(reading.points[4]).toEqual({ mhz: 7.1, swr: 1.3 });
  });

  it("drops a UTF-8 byte order mark, and reads Windows-1252 text when the file is not UTF-8", () => {
    const utf8 = readSweepFile(encode(`\uFEFFFreq;R (Ω);X\n${rows((i) => `${FREQS_MHZ[i]};${RS[i]};${XS[i]}`)}`));
    expect(utf8.problems).toEqual([]);
    expect(utf8.table?.columns.map((column) => column.name)).toEqual(["Freq", "R (Ω)", "X"]);
    // "é" is the single byte 0xE9 in Windows-1252, which is not valid UTF-8 on its own.
    const latin = new Uint8Array([...encode("Fr"), 0xe9, ...encode("quence (MHz),SWR\n"), ...encode(rows((i) => `${FREQS_MHZ[i]},${SWRS[i]}`))]);
    const reading = readSweepFile(latin);
    expect(reading.problems).toEqual([]);
    expect(reading.table?.columns[0].name).toBe("Fréquence (MHz)");
    expect(reading.mapping).toMatchObject({ frequencyColumn: 0, frequencyUnit: "MHz", quantity: "swr" });
  });
});

function problemsOf(file: string | Uint8Array, mapping?: SweepMapping): string[] {
  const reading = readSweepFile(typeof file === "string" ? encode(file) : file, mapping);
  expect(reading.points).toEqual([]);
  return reading.problems.map(problemText);
}

const good = (count = 9) => rows((i) => `${FREQS_MHZ[i]},${SWRS[i]}`).split("\n").slice(0, count);

describe("malformed files: nothing is read, and each problem names its line", () => {
  it.each([
    ["an empty file", "", ["The file is empty."]],
    ["a header and no numbers", "Freq,SWR\n", ["No rows of numbers were found: a sweep needs one row per frequency, with the frequency and at least one measured value."]],
    ["a word among the numbers", ["Freq,SWR", ...good(4), "7.1,high", ...good().slice(5)].join("\n"), ["line 6: “high” in column 2 (SWR) is not a number."]],
    ["a row with a column missing", ["Freq,SWR", ...good(3), "7.05", ...good().slice(4)].join("\n"), ["line 5: this row has 1 column; the rows above have 2."]],
    [
      "a frequency repeated",
      ["Freq,SWR", ...good(3), "7.0,1.5", ...good().slice(3)].join("\n"),
      ["line 5: the frequency 7 MHz is not above 7 MHz on line 4; a sweep goes up in frequency, one row per frequency."],
    ],
    ["an SWR below 1", ["Freq,SWR", ...good(2), "7.0,0.8", ...good().slice(3)].join("\n"), ["line 4: SWR 0.8 is below 1; an SWR is 1 or more. Is this the SWR column?"]],
    ["a frequency outside the range", ["Freq (MHz),SWR", "0.5,3", ...good().slice(1)].join("\n"), ["line 2: the frequency 0.5 MHz is outside 1–500 MHz; check the unit."]],
    ["too few points", ["Freq,SWR", ...good(4)].join("\n"), ["The file has 4 rows of numbers; a sweep needs at least 5 points."]],
    ["binary data", new Uint8Array([...encode("Freq,SWR\n7.0,1.5\n"), 0, 1, 2]), ["line 3: this is not a text file: it holds binary data. Export the sweep as CSV or text."]],
  ] as const)("%s", (_name, file, expected) => {
    expect(problemsOf(file as string | Uint8Array)).toEqual(expected);
  });

  it("names a negative resistance on its line", () => {
    const text = ["R,X,Freq", ...FREQS_MHZ.map((f, i) => `${i === 6 ? -3 : RS[i]},${XS[i]},${f}`)].join("\n");
    expect(problemsOf(text)).toEqual(["line 8: R -3 Ω is negative; an antenna's resistance is 0 or more. Is this the R column?"]);
  });

  it("refuses more than 5000 points at the line of the first one too many", () => {
    const lines = Array.from({ length: SWEEP_LIMITS.maxPoints + 1 }, (_, i) => `${(7 + i * 0.0001).toFixed(4)},1.5`);
    expect(problemsOf(["Freq,SWR", ...lines].join("\n"))).toEqual(["line 5002: more than 5000 points; a sweep may have at most 5000. Export a coarser step."]);
  });

  it("refuses a file over 1 MB before reading it", () => {
    const big = new Uint8Array(SWEEP_LIMITS.maxBytes + 1).fill(0x31);
    expect(problemsOf(big)).toEqual(["The file is 1.0 MB; a sweep file may be at most 1 MB."]);
  });

  it("lists several problems, each on its own line", () => {
    const text = ["Freq,SWR", "7.0,1.5", "7.1,x", "7.2,1.4,9", "7.3,1.6", "7.4,1.8", "7.5,2.0"].join("\n");
    expect(problemsOf(text)).toEqual(["line 3: “x” in column 2 (SWR) is not a number.", "line 4: this row has 3 columns; the rows above have 2."]);
  });

  it("asks for a column the mapping does not give, or gives twice", () => {
    const text = ["Freq,SWR", ...good()].join("\n");
    expect(problemsOf(text, { frequencyColumn: 0, frequencyUnit: "MHz", quantity: "impedance", swrColumn: null, rColumn: 1, xColumn: null, returnLossColumn: null })).toEqual([
      "Choose the column that holds X: the file has 2 columns.",
    ]);
    expect(problemsOf(text, { frequencyColumn: 0, frequencyUnit: "MHz", quantity: "swr", swrColumn: 0, rColumn: null, xColumn: null, returnLossColumn: null })).toEqual([
      "Each column can hold only one quantity: choose different columns.",
    ]);
  });

  it("says when the unit is wrong: MHz values read as Hz fall outside the range", () => {
    const text = ["Freq,SWR", ...good()].join("\n");
    expect(problemsOf(text, { frequencyColumn: 0, frequencyUnit: "Hz", quantity: "swr", swrColumn: 1, rColumn: null, xColumn: null, returnLossColumn: null })[0]).toBe(
      "line 2: the frequency 6.9 Hz is outside 1–500 MHz; check the unit.",
    );
  });
});
