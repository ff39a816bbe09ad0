"use client";

import { useRouter } from "next/navigation";
import { createDayAction, updateDayAction } from "@/app/(club)/antenna-days/actions";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { daySchema, dayEditSchema } from "@/validations/antenna-days";

interface Choices {
  sites: { id: string; name: string }[];
  leads: { id: string; name: string; callSign: string | null }[];
  timeZone: string;
}

export interface DayFormDefaults {
  title: string;
  siteId: string;
  startsAtLocal: string;
  endsAtLocal: string;
  meetingPoint: string;
  description: string;
  safetyLeadId: string;
}

function DayFields({ form, errorOf, choices }: { form: ReturnType<typeof useActionForm<typeof daySchema>>["form"]; errorOf: (field: string) => string | undefined; choices: Choices }) {
  return (
    <>
      <TextField label="Title" error={errorOf("title")} {...form.register("title")} />
      <SelectField
        label="Site"
        options={[{ value: "", label: "Choose a site" }, ...choices.sites.map((site) => ({ value: site.id, label: site.name }))]}
        error={errorOf("siteId")}
        {...form.register("siteId")}
      />
      <div className="grid gap-x-4 sm:grid-cols-2">
        <TextField label="Starts" type="datetime-local" hint={`Club time (${choices.timeZone}).`} error={errorOf("startsAtLocal")} {...form.register("startsAtLocal")} />
        <TextField label="Ends" type="datetime-local" hint={`Club time (${choices.timeZone}).`} error={errorOf("endsAtLocal")} {...form.register("endsAtLocal")} />
      </div>
      <TextField label="Meeting point" error={errorOf("meetingPoint")} {...form.register("meetingPoint")} />
      <SelectField
        label="Safety lead"
        hint="Watches masts, guys, power lines and RF exposure on the day."
        options={[{ value: "", label: "Choose a person" }, ...choices.leads.map((lead) => ({ value: lead.id, label: lead.callSign ? `${lead.name} (${lead.callSign})` : lead.name }))]}
        error={errorOf("safetyLeadId")}
        {...form.register("safetyLeadId")}
      />
      <TextAreaField label="Description" rows={5} error={errorOf("description")} {...form.register("description")} />
    </>
  );
}

export function NewDayForm({ choices, defaults }: { choices: Choices; defaults: DayFormDefaults }) {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(daySchema, createDayAction, {
    defaultValues: defaults,
    onSuccess: (result) => router.push(`/antenna-days/${(result.data as { dayId: string }).dayId}`),
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="New antenna day">
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <DayFields form={form} errorOf={errorOf} choices={choices} />
      <Button type="submit" disabled={submitting}>
        Save as draft
      </Button>
    </form>
  );
}

export function EditDayForm({ choices, defaults, dayId }: { choices: Choices; defaults: DayFormDefaults; dayId: string }) {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(dayEditSchema, updateDayAction, {
    defaultValues: { ...defaults, dayId },
    onSuccess: () => router.push(`/antenna-days/${dayId}`),
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Edit antenna day">
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <DayFields form={form as never} errorOf={errorOf} choices={choices} />
      <Button type="submit" disabled={submitting}>
        Save changes
      </Button>
    </form>
  );
}
