// The plan form's values against the engine's own schema: every family's request from the
// form is one the engine accepts, carries only that family's keys, and reads back unchanged.
import { describe, expect, it } from "vitest";
import { FAMILY_IDS, planRequestSchema } from "@/lib/antenna/plan-schema";
import { DEFAULT_FORM_VALUES, FAMILY_FIELDS, formOfRequest, requestOfForm } from "@/lib/plan-screen/form-values";

describe("plan form values", () => {
  for (const family of FAMILY_IDS) {
    it(`builds a ${family} request the engine accepts, with only that family's own keys`, () => {
      const request = requestOfForm({ ...DEFAULT_FORM_VALUES, family }, 1);
      const parsed = planRequestSchema.safeParse(request);
      expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
      const others = FAMILY_IDS.filter((other) => other !== family).flatMap((other) => FAMILY_FIELDS[other] as readonly string[]);
      for (const key of others) expect(request).not.toHaveProperty(key);
      expect(formOfRequest(request)).toEqual({ ...DEFAULT_FORM_VALUES, family });
    });
  }

  it("keeps what was typed for one family while another is shown", () => {
    const values = formOfRequest({ ...requestOfForm(DEFAULT_FORM_VALUES, 2), family: "inverted-v", includedAngleDeg: 100 } as never);
    expect(values.includedAngleDeg).toBe(100);
    expect(requestOfForm({ ...values, family: "dipole" }, 2)).not.toHaveProperty("includedAngleDeg");
    expect(requestOfForm(values, 2)).toMatchObject({ family: "inverted-v", includedAngleDeg: 100 });
  });

  it("sends a custom ground as σ and εr, and leaves empty optional settings to the engine", () => {
    const request = requestOfForm({ ...DEFAULT_FORM_VALUES, family: "end-fed", ground: "custom", customGround: { conductivitySm: 0.01, relativePermittivity: 15 } }, 3);
    expect(request.ground).toEqual({ conductivitySm: 0.01, relativePermittivity: 15 });
    expect(request).not.toHaveProperty("farEndHeightM");
    expect(planRequestSchema.safeParse(request).success).toBe(true);
  });
});
