"use client";

import { useRouter } from "next/navigation";
import { useTransition } from "react";
import { deleteSlotAction, saveSlotAction } from "@/app/(club)/antenna-days/actions";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { FEEDLINE_TYPES } from "@/lib/antenna/feedline-types";
import { MODE_DUTY } from "@/lib/antenna/exposure";
import { FAMILY_IDS, type FamilyId } from "@/lib/antenna/plan-schema";
import { FEEDLINE_SLACK_FIXED_M, FEEDLINE_SLACK_FRACTION, SLOT_MODES } from "@/lib/antenna-days/slot-plan";
import { familyFields, familyHeightLabels, familyLabels, slotFormSchema, type SlotFormValues } from "@/validations/slot-form";

interface SlotFormProps {
  dayId: string;
  slotId: string | null;
  bandNames: string[];
  site: { widthM: number; depthM: number };
  defaults: SlotFormValues;
}

export function SlotForm({ dayId, slotId, bandNames, site, defaults }: SlotFormProps) {
  const router = useRouter();
  const [deleting, startDelete] = useTransition();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(slotFormSchema, saveSlotAction, {
    defaultValues: defaults,
    onSuccess: () => router.push(`/antenna-days/${dayId}`),
  });
  const family = form.watch("planParams.family") as FamilyId;
  const bandsError = errorOf("bands");
  return (
    <form onSubmit={onSubmit} noValidate aria-label={slotId ? "Edit station slot" : "New station slot"}>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <input type="hidden" {...form.register("dayId")} />
      <input type="hidden" {...form.register("slotId")} />
      <TextField label="Station name" error={errorOf("name")} {...form.register("name")} />
      <fieldset className="mb-4" aria-describedby={bandsError ? "bands-error" : undefined}>
        <legend className="font-bold text-slate-800">Bands</legend>
        <p className="text-sm text-slate-600">A single-band antenna is cut for the lowest band chosen; a fan dipole takes two or three.</p>
        <div className="mt-1 flex flex-wrap gap-x-4">
          {bandNames.map((band) => (
            <label key={band} className="flex min-h-11 items-center gap-2">
              <input type="checkbox" value={band} className="size-5 accent-copper-700" {...form.register("bands")} />
              {band}
            </label>
          ))}
        </div>
        {bandsError && (
          <p id="bands-error" className="mt-1 text-sm font-bold text-danger-600" role="alert">
            {bandsError}
          </p>
        )}
      </fieldset>
      <div className="grid gap-x-4 sm:grid-cols-2">
        <TextField label="Power (W, PEP)" type="number" min={1} error={errorOf("powerW")} {...form.register("powerW")} />
        <SelectField label="Mode" options={SLOT_MODES.map((mode) => ({ value: mode, label: MODE_DUTY[mode].label }))} error={errorOf("mode")} {...form.register("mode")} />
      </div>

      <h2 className="mt-2 mb-2">Antenna plan</h2>
      <SelectField label="Antenna family" options={FAMILY_IDS.map((id) => ({ value: id, label: familyLabels[id] }))} error={errorOf("planParams.family")} {...form.register("planParams.family")} />
      <div className="grid gap-x-4 sm:grid-cols-3">
        <TextField label={familyHeightLabels[family] ?? "Height (m)"} type="number" step="0.1" error={errorOf("planParams.heightM")} {...form.register("planParams.heightM")} />
        <TextField label="Wire diameter (mm)" type="number" step="0.1" error={errorOf("planParams.wireDiameterMm")} {...form.register("planParams.wireDiameterMm")} />
        <SelectField label="Coax" options={FEEDLINE_TYPES.map((type) => ({ value: type.id, label: type.label }))} error={errorOf("planParams.feedlineType")} {...form.register("planParams.feedlineType")} />
        {(familyFields[family] ?? []).map((field) =>
          field.options ? (
            <SelectField
              key={field.name}
              label={field.label}
              options={field.options.map((option) => ({ value: option, label: option }))}
              error={errorOf(`planParams.${field.name}`)}
              {...form.register(`planParams.${field.name}`)}
            />
          ) : (
            <TextField key={field.name} label={field.label} hint={field.hint} type="number" step="any" error={errorOf(`planParams.${field.name}`)} {...form.register(`planParams.${field.name}`)} />
          ),
        )}
      </div>
      <p className="mb-4 text-sm text-slate-600">Saving computes the antenna with the engine; the antenna plan screen shows the full results and lets you fine-tune it.</p>

      <h2 className="mt-2 mb-2">Place on the site plan</h2>
      <p className="mb-2 text-sm text-slate-600">
        Metres from the site&apos;s south-west corner (x east 0–{site.widthM}, y north 0–{site.depthM}). You can also drag the mast on the plan.
      </p>
      <div className="grid gap-x-4 sm:grid-cols-3">
        <TextField label="Mast x (m east)" type="number" step="0.5" error={errorOf("x")} {...form.register("x")} />
        <TextField label="Mast y (m north)" type="number" step="0.5" error={errorOf("y")} {...form.register("y")} />
        <TextField label="Wire bearing (° from north)" type="number" step="1" error={errorOf("azimuthDeg")} {...form.register("azimuthDeg")} />
        <TextField label="Operating tent x (m east)" type="number" step="0.5" error={errorOf("tentX")} {...form.register("tentX")} />
        <TextField label="Operating tent y (m north)" type="number" step="0.5" error={errorOf("tentY")} {...form.register("tentY")} />
        <TextField
          label="Feedline run (m)"
          type="number"
          step="0.5"
          hint={`Empty: mast-to-tent distance + mast height + ${FEEDLINE_SLACK_FIXED_M} m + ${FEEDLINE_SLACK_FRACTION * 100} % of the distance as slack (common practice).`}
          error={errorOf("feedlineRunOverrideM")}
          {...form.register("feedlineRunOverrideM")}
        />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={submitting}>
          {submitting ? "Computing the antenna…" : "Save station slot"}
        </Button>
        {slotId && (
          <Button
            variant="danger"
            disabled={deleting}
            onClick={() => {
              if (!window.confirm("Delete this station slot and its shifts?")) return;
              startDelete(async () => {
                const result = await deleteSlotAction({ dayId, slotId });
                if (result.ok) router.push(`/antenna-days/${dayId}`);
              });
            }}
          >
            Delete slot
          </Button>
        )}
      </div>
    </form>
  );
}
