"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { z } from "zod";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { planNameField, planNotesField } from "@/validations/plans";
import { deleteLibraryPlanAction, renameLibraryPlanAction } from "../actions";

const editorSchema = z.object({ id: z.uuid(), name: planNameField, notes: planNotesField });

export function LibraryPlanEditor({ id, name, notes, inUse }: { id: string; name: string; notes: string; inUse: boolean }) {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(editorSchema, renameLibraryPlanAction, {
    defaultValues: { id, name, notes },
    onSuccess: () => router.refresh(),
  });
  const [deleteMessage, setDeleteMessage] = useState<string | null>(null);
  const remove = async () => {
    if (!window.confirm(`Delete “${name}” from the plan library?`)) return;
    const result = await deleteLibraryPlanAction({ id });
    if (result.ok) router.push("/bench/library");
    else setDeleteMessage(result.message ?? "The plan could not be deleted.");
  };
  return (
    <>
      <form onSubmit={onSubmit} noValidate aria-label="Name and notes">
        {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
        <input type="hidden" {...form.register("id")} />
        <TextField label="Name" error={errorOf("name")} {...form.register("name")} />
        <TextAreaField label="Notes" rows={3} error={errorOf("notes")} {...form.register("notes")} />
        <Button type="submit" disabled={submitting}>
          Save name and notes
        </Button>
      </form>
      <div className="mt-6 border-t border-slate-200 pt-4">
        {deleteMessage && <Notice tone="danger">{deleteMessage}</Notice>}
        {inUse ? (
          <p className="text-sm text-slate-700">Station slots or build sessions use this plan, so it cannot be deleted.</p>
        ) : (
          <Button variant="danger" onClick={remove}>
            Delete this plan
          </Button>
        )}
      </div>
    </>
  );
}
