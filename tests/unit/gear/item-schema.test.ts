// The item schema as the form and the import use it: text in, typed details out, a clear
// message per field. Guyline's own rules (issue 5, item 1: details validated per kind).
import { describe, expect, it } from "vitest";
import { gearItemSchema } from "@/validations/gear";

const mast = { kind: "mast", labelCode: "ma-09", name: "Mast", condition: "good", location: "Rack", guyKit: "3 guys" };

describe("the item schema", () => {
  it("asks for a blank number, refuses words, and reads a decimal comma", () => {
    const blank = gearItemSchema.safeParse({ ...mast, heightM: "" });
    expect(blank.error?.issues).toEqual([expect.objectContaining({ path: ["heightM"], message: "Enter the height." })]);
    const words = gearItemSchema.safeParse({ ...mast, heightM: "nine" });
    expect(words.error?.issues[0].message).toBe("The height must be a number.");
    expect(gearItemSchema.parse({ ...mast, heightM: "9,5" })).toMatchObject({ heightM: 9.5, labelCode: "MA-09" });
  });

  it("drops the details of other kinds and keeps the chosen kind's", () => {
    const parsed = gearItemSchema.parse({ ...mast, heightM: "6", cableType: "rg213", minMhz: "3" });
    expect(parsed).not.toHaveProperty("cableType");
    expect(parsed).not.toHaveProperty("minMhz");
    expect(parsed).toMatchObject({ kind: "mast", heightM: 6, notes: null });
  });

  it("names an unknown kind", () => {
    expect(gearItemSchema.safeParse({ ...mast, kind: "gizmo" }).error?.issues[0]).toMatchObject({ path: ["kind"], message: "Choose a kind of item." });
  });
});
