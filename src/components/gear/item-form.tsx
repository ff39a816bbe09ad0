"use client";
// Adding or editing an item: the common fields, then the details of the chosen kind.
import { useRouter } from "next/navigation";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import {
  approvalRuleLabels,
  approvalRules,
  cableTypeIds,
  cableTypeLabels,
  coaxConnectorLabels,
  coaxConnectors,
  defaultApprovalRule,
  gearConditionLabels,
  gearKindLabels,
  gearKinds,
  shelfConditions,
  transformerRatios,
  transformerStyles,
  type GearKind,
} from "@/lib/gear/kinds";
import type { ActionResult } from "@/server/action";
import { gearItemSchema, type GearItemFormValues } from "@/validations/gear";

const options = <T extends string>(values: readonly T[], labels: Record<T, string>) => values.map((value) => ({ value, label: labels[value] }));

export function ItemForm({
  action,
  defaultValues,
  submitLabel,
}: {
  action: (input: GearItemFormValues) => Promise<ActionResult<{ id: string } | undefined>>;
  defaultValues: GearItemFormValues;
  submitLabel: string;
}) {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(gearItemSchema, action, {
    defaultValues,
    onSuccess: (result) => {
      const id = (result.data as { id: string } | undefined)?.id;
      if (id) router.push(`/gear/${id}`);
    },
  });
  const kind = form.watch("kind") as GearKind;
  // Fields of other kinds are left in the form's values; the schema drops them.
  const field = (name: string) => form.register(name as never);

  return (
    <form onSubmit={onSubmit} noValidate aria-label={submitLabel}>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <div className="grid gap-x-4 sm:grid-cols-2">
        <SelectField label="Kind" options={options(gearKinds, gearKindLabels)} error={errorOf("kind")} {...field("kind")} />
        <TextField label="Label code" hint="2–12 letters, digits or hyphens, printed on the QR label" error={errorOf("labelCode")} {...field("labelCode")} />
        <TextField label="Name" error={errorOf("name")} {...field("name")} />
        <SelectField label="Condition" options={options(shelfConditions, gearConditionLabels)} error={errorOf("condition")} {...field("condition")} />
        <TextField label="Kept in" hint="Where the item is stored" error={errorOf("location")} {...field("location")} />
        <SelectField
          label="Approval"
          hint={`Default for this kind: ${approvalRuleLabels[defaultApprovalRule(kind ?? "other")].toLowerCase()}`}
          options={[{ value: "", label: "The kind's default" }, ...options(approvalRules, approvalRuleLabels)]}
          error={errorOf("approvalRule")}
          {...field("approvalRule")}
        />
      </div>
      {kind === "analyser" && (
        <fieldset className="mb-4 grid gap-x-4 rounded-lg border border-slate-300 p-4 sm:grid-cols-2">
          <legend className="px-1 font-bold">Analyser</legend>
          <TextField label="Lowest frequency (MHz)" inputMode="decimal" error={errorOf("minMhz")} {...field("minMhz")} />
          <TextField label="Highest frequency (MHz)" inputMode="decimal" error={errorOf("maxMhz")} {...field("maxMhz")} />
          <TextField label="Battery last checked" type="date" error={errorOf("batteryCheckedOn")} {...field("batteryCheckedOn")} />
          <TextField label="Calibration last checked" type="date" error={errorOf("calibrationCheckedOn")} {...field("calibrationCheckedOn")} />
        </fieldset>
      )}
      {kind === "coax" && (
        <fieldset className="mb-4 grid gap-x-4 rounded-lg border border-slate-300 p-4 sm:grid-cols-2">
          <legend className="px-1 font-bold">Coax run</legend>
          <SelectField label="Cable type" hint="From the antenna engine's feedline table" options={options(cableTypeIds, cableTypeLabels)} error={errorOf("cableType")} {...field("cableType")} />
          <TextField label="Length (m)" inputMode="decimal" error={errorOf("lengthM")} {...field("lengthM")} />
          <SelectField label="Connector, one end" options={options(coaxConnectors, coaxConnectorLabels)} error={errorOf("connectorA")} {...field("connectorA")} />
          <SelectField label="Connector, other end" options={options(coaxConnectors, coaxConnectorLabels)} error={errorOf("connectorB")} {...field("connectorB")} />
        </fieldset>
      )}
      {kind === "mast" && (
        <fieldset className="mb-4 grid gap-x-4 rounded-lg border border-slate-300 p-4 sm:grid-cols-2">
          <legend className="px-1 font-bold">Mast and guy kit</legend>
          <TextField label="Height (m)" inputMode="decimal" error={errorOf("heightM")} {...field("heightM")} />
          <TextField label="Guy kit" hint="Levels, guys, stakes; or none" error={errorOf("guyKit")} {...field("guyKit")} />
          <p className="text-sm text-caution-800 sm:col-span-2">
            Masts can fall: guy them as their maker says, keep the fall zone clear of people, paths and power lines, and follow local codes.
          </p>
        </fieldset>
      )}
      {kind === "balun" && (
        <fieldset className="mb-4 grid gap-x-4 rounded-lg border border-slate-300 p-4 sm:grid-cols-3">
          <legend className="px-1 font-bold">Balun or unun</legend>
          <SelectField label="Type" options={transformerStyles.map((style) => ({ value: style, label: style === "balun" ? "Balun" : "Unun" }))} error={errorOf("transformerStyle")} {...field("transformerStyle")} />
          <SelectField label="Impedance ratio" options={transformerRatios.map((ratio) => ({ value: ratio, label: ratio }))} error={errorOf("transformerRatio")} {...field("transformerRatio")} />
          <TextField label="Power rating (W)" inputMode="numeric" error={errorOf("powerRatingW")} {...field("powerRatingW")} />
        </fieldset>
      )}
      <TextAreaField label="Notes" rows={3} error={errorOf("notes")} {...field("notes")} />
      <Button type="submit" disabled={submitting}>
        {submitLabel}
      </Button>
    </form>
  );
}
