// Reading a CSV import: row-level problems with line and column, nothing partial.
// Source: RFC 4180, Common Format and MIME Type for Comma-Separated Values (CSV) Files, §2
// (quoted fields may contain line breaks and doubled quotes); the columns are Guyline's own.
import { describe, expect, it } from "vitest";
import { readGearCsv, writeGearCsv } from "@/lib/gear/csv";

const header = "label_code,name,kind,condition,location,notes,cable_type,length_m,connector_a,connector_b,min_mhz,max_mhz";

describe("reading a gear CSV", () => {
  it("reads good rows of several kinds", () => {
    const text = [header, "cx-01,Twenty metre run,coax,good,Crate A,,rg213,20,pl259,n,,", "AN-09,Field analyser,analyser,worn,Cupboard,,,,,,0.5,60"].join("\n");
    const reading = readGearCsv(text);
    expect(reading.problems).toEqual([]);
    expect(reading.rows).toHaveLength(2);
    expect(reading.rows[0]).toMatchObject({ line: 2, item: { labelCode: "CX-01", kind: "coax", cableType: "rg213", lengthM: 20 } });
    expect(reading.rows[1].item).toMatchObject({ kind: "analyser", minMhz: 0.5, maxMhz: 60 });
  });

  it("names the line and the column of every problem, counting lines inside quoted fields", () => {
    const text = [
      header,
      'CX-02,Run,coax,good,Crate,"two\nline note",rg213,20,pl259,pl259,,',
      "CX-03,Run,coax,shiny,Crate,,rg999,-4,pl259,pl259,,",
      "CX-02,Again,coax,good,Crate,,rg58,5,bnc,bnc,,",
      "XX-01,Thing,gizmo,good,Shed,,,,,,,",
    ].join("\n");
    const { problems } = readGearCsv(text);
    expect(problems).toEqual(
      expect.arrayContaining([
        { line: 4, field: "condition", message: expect.any(String) },
        { line: 4, field: "cable_type", message: "Choose a cable type from the feedline table." },
        { line: 4, field: "length_m", message: "The length must be at least 0.1 m." },
        { line: 5, field: "label_code", message: "The label code CX-02 is already used on line 2." },
        { line: 6, field: "kind", message: expect.any(String) },
      ]),
    );
  });

  it("refuses a file without the required columns or with unknown ones", () => {
    expect(readGearCsv("name,kind\nX,coax").problems.map((problem) => problem.field)).toEqual(["label_code", "condition", "location"]);
    expect(readGearCsv(`${header},colour\n`).problems).toContainEqual({ line: 1, field: "colour", message: '"colour" is not a column Guyline knows.' });
    expect(readGearCsv("").problems).toEqual([{ line: 1, field: "", message: "The file is empty." }]);
  });

  it("round-trips an export, defusing spreadsheet formulas on the way out", () => {
    const csv = writeGearCsv([{ labelCode: "MA-01", name: "Push-up mast", kind: "mast", condition: "good", location: "Shed", notes: "=HYPERLINK(1)", heightM: 10, guyKit: "3 guys" }]);
    expect(csv.split("\r\n")[1]).toContain("'=HYPERLINK(1)");
    const reading = readGearCsv(csv);
    expect(reading.problems).toEqual([]);
    expect(reading.rows[0].item).toMatchObject({ labelCode: "MA-01", kind: "mast", heightM: 10, notes: "=HYPERLINK(1)" });
  });
});
