// The plan form checks its values with the engine's own schema: each problem lands on the
// form field it names, the custom ground's on the form's own fields for it.
import { describe, expect, it } from "vitest";
import { engineResolver, requestProblems } from "@/components/antenna-plan/engine-resolver";
import { DEFAULT_FORM_VALUES, requestOfForm, type PlanFormValues } from "@/lib/plan-screen/form-values";

const toRequest = (values: PlanFormValues) => requestOfForm(values, 1);
const resolve = (values: PlanFormValues) => engineResolver(toRequest)(values, undefined, { fields: {}, shouldUseNativeValidation: false });

describe("the plan form's resolver", () => {
  it("passes the default values", async () => {
    expect(await resolve(DEFAULT_FORM_VALUES)).toEqual({ values: DEFAULT_FORM_VALUES, errors: {} });
  });

  it("puts the engine's problems on the fields they name, nested as the form holds them", async () => {
    const { errors } = await resolve({ ...DEFAULT_FORM_VALUES, heightM: -1, feedline: { type: "rg213", lengthM: -5 } });
    expect(errors).toMatchObject({ heightM: { message: "must be greater than 0" }, feedline: { lengthM: { message: "must be 0 or more" } } });
  });

  it("names a custom ground's fields as the form does, and an empty number as not a number", async () => {
    const problems = requestProblems(toRequest({ ...DEFAULT_FORM_VALUES, ground: "custom", customGround: { conductivitySm: 0, relativePermittivity: 13 } }));
    expect(problems).toEqual([{ path: "customGround.conductivitySm", message: "must be greater than 0" }]);
    const empty = requestProblems(toRequest({ ...DEFAULT_FORM_VALUES, wireDiameterMm: undefined as unknown as number }));
    expect(empty.map((problem) => problem.path)).toEqual(["wireDiameterMm"]);
  });
});
