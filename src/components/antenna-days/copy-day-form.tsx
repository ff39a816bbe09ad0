"use client";

import { useRouter } from "next/navigation";
import { copyDayAction } from "@/app/(club)/antenna-days/actions";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { copyDayFormSchema } from "@/validations/antenna-days";

export function CopyDayForm({ sourceId, defaults, timeZone }: { sourceId: string; defaults: { title: string; startsAtLocal: string; endsAtLocal: string }; timeZone: string }) {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(copyDayFormSchema, copyDayAction, {
    defaultValues: { sourceId, ...defaults },
    onSuccess: (result) => router.push(`/antenna-days/${(result.data as { dayId: string }).dayId}`),
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Copy as a new day">
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <TextField label="Title of the new day" error={errorOf("title")} {...form.register("title")} />
      <div className="grid gap-x-4 sm:grid-cols-2">
        <TextField label="Starts" type="datetime-local" hint={`Club time (${timeZone}).`} error={errorOf("startsAtLocal")} {...form.register("startsAtLocal")} />
        <TextField label="Ends" type="datetime-local" hint={`Club time (${timeZone}).`} error={errorOf("endsAtLocal")} {...form.register("endsAtLocal")} />
      </div>
      <Button type="submit" disabled={submitting}>
        Create the copy as a draft
      </Button>
    </form>
  );
}
