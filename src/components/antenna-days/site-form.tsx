"use client";

import { useRouter } from "next/navigation";
import { useFieldArray } from "react-hook-form";
import { saveSiteAction } from "@/app/(club)/sites/actions";
import { SitePlan } from "@/components/antenna-days/site-plan";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { GROUND_CLASSES } from "@/lib/antenna/ground-classes";
import { HAZARD_KINDS, hazardHasHeight, hazardKindLabels, hazardPointCounts, type Hazard, type HazardKind } from "@/lib/site-plan/hazards";
import { parsePointsText, siteFormSchema } from "@/validations/antenna-days";
import type { z } from "zod";

export type SiteFormValues = z.input<typeof siteFormSchema>;

const groundOptions = [...GROUND_CLASSES.map((ground) => ({ value: ground.id, label: ground.label })), { value: "custom", label: "Custom (σ and εr)" }];

/** Hazards as far as they read, for the live preview; rows still being typed are left out. */
function previewHazards(rows: SiteFormValues["hazards"]): Hazard[] {
  return (rows ?? []).flatMap((row) => {
    const points = parsePointsText(row.pointsText ?? "");
    const { min, max } = hazardPointCounts[row.kind];
    if (points.length < min || points.length > max || !points.every((point) => point.length === 2 && point.every(Number.isFinite))) return [];
    const heightM = Number(row.heightM);
    if (hazardHasHeight(row.kind) && !(heightM > 0)) return [];
    return [{ kind: row.kind, label: row.label || hazardKindLabels[row.kind], points, ...(hazardHasHeight(row.kind) ? { heightM } : {}) } as Hazard];
  });
}

export function SiteForm({ defaults }: { defaults: SiteFormValues }) {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(siteFormSchema, saveSiteAction, {
    defaultValues: defaults,
    onSuccess: (result) => router.push(`/sites/${(result.data as { siteId: string }).siteId}`),
  });
  const hazards = useFieldArray({ control: form.control, name: "hazards" });
  const groundClass = form.watch("groundClass");
  const watched = form.watch(["widthM", "depthM", "name", "hazards"]);
  const width = Number(watched[0]);
  const depth = Number(watched[1]);

  return (
    <form onSubmit={onSubmit} noValidate aria-label={defaults.siteId ? "Edit site" : "New site"}>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <input type="hidden" {...form.register("siteId")} />
      <TextField label="Site name" error={errorOf("name")} {...form.register("name")} />
      <div className="grid gap-x-4 sm:grid-cols-2">
        <TextField label="Width, west to east (m)" type="number" step="1" error={errorOf("widthM")} {...form.register("widthM")} />
        <TextField label="Depth, south to north (m)" type="number" step="1" error={errorOf("depthM")} {...form.register("depthM")} />
      </div>
      <SelectField label="Ground" hint="Feeds the antenna model's ground. Real ground varies with moisture and frequency." options={groundOptions} error={errorOf("groundClass")} {...form.register("groundClass")} />
      {groundClass === "custom" && (
        <div className="grid gap-x-4 sm:grid-cols-2">
          <TextField label="Conductivity σ (S/m)" type="number" step="any" error={errorOf("groundConductivitySm")} {...form.register("groundConductivitySm")} />
          <TextField label="Relative permittivity εr" type="number" step="any" error={errorOf("groundRelativePermittivity")} {...form.register("groundRelativePermittivity")} />
        </div>
      )}
      <TextAreaField label="Notes" rows={3} error={errorOf("notes")} {...form.register("notes")} />

      <fieldset className="mb-4">
        <legend className="text-lg font-bold">Hazards</legend>
        <p className="text-sm text-slate-600">
          Points in metres from the south-west corner, x east and y north, as pairs separated by semicolons: <code>0,90; 200,110</code>. Lines need two points or more, areas and
          buildings three, a tree one. Mark power lines even just outside the site.
        </p>
        {hazards.fields.map((field, index) => {
          const kind = form.watch(`hazards.${index}.kind`) as HazardKind;
          return (
            <div key={field.id} className="mt-3 grid gap-x-4 rounded-lg border border-slate-200 p-3 sm:grid-cols-4" role="group" aria-label={`Hazard ${index + 1}`}>
              <SelectField label="Kind" options={HAZARD_KINDS.map((value) => ({ value, label: hazardKindLabels[value] }))} error={errorOf(`hazards.${index}.kind`)} {...form.register(`hazards.${index}.kind`)} />
              <TextField label="Label" error={errorOf(`hazards.${index}.label`)} {...form.register(`hazards.${index}.label`)} />
              <TextField label="Points (x,y; x,y …)" error={errorOf(`hazards.${index}.pointsText`) ?? errorOf(`hazards.${index}.points`)} {...form.register(`hazards.${index}.pointsText`)} />
              {hazardHasHeight(kind) ? (
                <TextField label="Height (m)" type="number" step="any" error={errorOf(`hazards.${index}.heightM`)} {...form.register(`hazards.${index}.heightM`)} />
              ) : (
                <input type="hidden" {...form.register(`hazards.${index}.heightM`)} />
              )}
              <div className="sm:col-span-4">
                <Button variant="quiet" onClick={() => hazards.remove(index)}>
                  Remove hazard {index + 1}
                </Button>
              </div>
            </div>
          );
        })}
        <Button variant="secondary" className="mt-3" onClick={() => hazards.append({ kind: "power-line", label: "", pointsText: "", heightM: "" })}>
          Add a hazard
        </Button>
      </fieldset>

      {width > 0 && depth > 0 && (
        <div className="mb-4">
          <h2 className="mb-2">Preview</h2>
          <SitePlan site={{ name: String(watched[2] || "the site"), widthM: width, depthM: depth, hazards: previewHazards(watched[3]) }} slots={[]} editable={false} />
        </div>
      )}
      <Button type="submit" disabled={submitting}>
        Save site
      </Button>
    </form>
  );
}
