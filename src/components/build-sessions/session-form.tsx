"use client";

import { useRouter } from "next/navigation";
import { useWatch } from "react-hook-form";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { CheckboxField, FieldShell, SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { ActionResult } from "@/server/action";
import { buildSessionFormSchema, editBuildSessionFormSchema, type BuildSessionFormValues } from "@/validations/build-sessions";

type Option = { value: string; label: string };

/** A plan from the plan library that the form can show: choosing it fills in the plan fields. */
export interface LibraryPlanChoice extends Option {
  plan: BuildSessionFormValues["plan"];
}

export interface SessionFormChoices {
  libraryPlans: LibraryPlanChoice[];
  families: Option[];
  bands: Option[];
  feedlines: Option[];
  grounds: Option[];
  mentors: Option[];
  timeZone: string;
}

interface SessionFormProps {
  choices: SessionFormChoices;
  defaults: BuildSessionFormValues & { id?: string };
  action: (input: never) => Promise<ActionResult<{ id: string }>>;
  submitLabel: string;
}

export function SessionForm({ choices, defaults, action, submitLabel }: SessionFormProps) {
  const router = useRouter();
  const schema = defaults.id ? editBuildSessionFormSchema : buildSessionFormSchema;
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(schema, action as never, {
    defaultValues: defaults as never,
    onSuccess: (result) => {
      const id = (result.data as { id: string } | undefined)?.id;
      if (id) router.push(`/build-sessions/${id}`);
    },
  });
  // useWatch, not form.watch: choosing a library plan sets all of "plan" at once, and only a
  // value subscription hears a change of the parent object.
  const family = useWatch({ control: form.control, name: "plan.family" });
  const register = form.register;
  const libraryPlan = register("libraryPlanId", {
    onChange: (event: { target: { value: string } }) => {
      const choice = choices.libraryPlans.find((option) => option.value === event.target.value);
      if (choice) form.setValue("plan", choice.plan, { shouldDirty: true });
    },
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={submitLabel}>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      {defaults.id && <input type="hidden" {...register("id" as never)} />}
      <input type="hidden" {...register("plan.region")} />
      <div className="grid gap-x-4 md:grid-cols-2">
        <TextField label="Title" hint="For example: Build a 20 m dipole" error={errorOf("title")} {...register("title")} />
        <TextField label="Place" hint="Free text: a hall, a workshop, a field" error={errorOf("place")} {...register("place")} />
        <TextField label="Starts" type="datetime-local" hint={`${choices.timeZone} time`} error={errorOf("startsAt")} {...register("startsAt")} />
        <TextField label="Ends" type="datetime-local" hint={`${choices.timeZone} time`} error={errorOf("endsAt")} {...register("endsAt")} />
        <TextField label="Places" type="number" min={1} max={100} error={errorOf("capacity")} {...register("capacity")} />
        <div className="pt-7">
          <CheckboxField label="The build ends with raising a mast" {...register("raisesMast")} />
        </div>
      </div>

      <fieldset className="mb-4 rounded-lg border border-slate-300 p-4">
        <legend className="px-1 font-bold">The antenna plan</legend>
        <SelectField
          label="Start from a library plan"
          hint="What is built: choosing a plan fills in the fields below; a change you make there stays with this session."
          options={[{ value: "", label: "None: the plan below" }, ...choices.libraryPlans]}
          error={errorOf("libraryPlanId")}
          {...libraryPlan}
        />
        <div className="grid gap-x-4 md:grid-cols-2">
          <SelectField label="Antenna" options={choices.families} error={errorOf("plan.family")} {...register("plan.family")} />
          <SelectField label="Band" options={choices.bands} error={errorOf("plan.band")} {...register("plan.band")} />
          <TextField label="Height (m)" type="number" step="0.1" error={errorOf("plan.heightM")} {...register("plan.heightM")} />
          <TextField label="Wire diameter (mm)" type="number" step="0.1" error={errorOf("plan.wireDiameterMm")} {...register("plan.wireDiameterMm")} />
          <SelectField label="Ground" options={choices.grounds} error={errorOf("plan.ground")} {...register("plan.ground")} />
          <SelectField label="Feedline" options={choices.feedlines} error={errorOf("plan.feedline.type")} {...register("plan.feedline.type")} />
          <TextField label="Feedline length (m)" type="number" step="0.5" error={errorOf("plan.feedline.lengthM")} {...register("plan.feedline.lengthM")} />
          {family === "inverted-v" && (
            <TextField label="Angle between the legs (°)" type="number" error={errorOf("plan.includedAngleDeg")} {...register("plan.includedAngleDeg")} />
          )}
          {family === "vertical" && (
            <>
              <TextField label="Radials" type="number" error={errorOf("plan.radials")} {...register("plan.radials")} />
              <TextField label="Radial droop (°)" type="number" error={errorOf("plan.radialDroopDeg")} {...register("plan.radialDroopDeg")} />
            </>
          )}
          {family === "end-fed" && (
            <SelectField
              label="Unun"
              options={[
                { value: "49:1", label: "49:1" },
                { value: "64:1", label: "64:1" },
              ]}
              error={errorOf("plan.unun")}
              {...register("plan.unun")}
            />
          )}
          {family === "off-centre-fed" && (
            <TextField label="Feed point (fraction of the length)" type="number" step="0.01" error={errorOf("plan.feedPosition")} {...register("plan.feedPosition")} />
          )}
        </div>
        <p className="text-sm text-slate-600">The antenna engine computes the cut lengths, the balun or unun and the materials from these.</p>
      </fieldset>

      <FieldShell label="Mentors" error={errorOf("mentorIds")} hint="Members with the mentor flag">
        {({ describedBy }) => (
          <div className="mt-1 grid gap-1 sm:grid-cols-2" aria-describedby={describedBy}>
            {choices.mentors.map((mentor) => (
              <label key={mentor.value} className="flex min-h-11 items-center gap-3">
                <input type="checkbox" className="size-5 accent-copper-700" value={mentor.value} {...register("mentorIds")} />
                {mentor.label}
              </label>
            ))}
          </div>
        )}
      </FieldShell>
      <TextAreaField label="Notes for participants (optional)" rows={3} error={errorOf("notes")} {...register("notes")} />
      <Button type="submit" disabled={submitting}>
        {submitLabel}
      </Button>
    </form>
  );
}
