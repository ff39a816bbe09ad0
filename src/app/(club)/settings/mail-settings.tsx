"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { CheckboxField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { formatInZone } from "@/lib/time";
import type { ActionResult } from "@/server/action";
import { alwaysSentSummary, mailCategoryLabels, optionalMailCategories, type OptionalMailCategory } from "@/lib/mail/categories";
import { mailChoicesSchema } from "@/validations/mail";
import { renewFeedAction, revokeFeedAction, updateMailChoicesAction } from "./actions";

export function MailChoicesForm({ defaults }: { defaults: Record<OptionalMailCategory, boolean> }) {
  const { form, onSubmit, formMessage, submitting } = useActionForm(mailChoicesSchema, updateMailChoicesAction, { defaultValues: defaults });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="E-mail choices">
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      {optionalMailCategories.map((category) => (
        <CheckboxField key={category} label={mailCategoryLabels[category]} {...form.register(category)} />
      ))}
      <p className="mb-4 text-sm text-slate-600">{alwaysSentSummary}</p>
      <Button type="submit" disabled={submitting}>
        Save my e-mail choices
      </Button>
    </form>
  );
}

export function CalendarFeedControls({ active, since, timeZone }: { active: boolean; since: string | null; timeZone: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [url, setUrl] = useState<string | null>(null);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const run = (action: (input: Record<string, never>) => Promise<ActionResult<{ url: string } | undefined>>) =>
    startTransition(async () => {
      const result = await action({});
      setMessage({ ok: result.ok, text: result.message ?? "That did not work." });
      setUrl(result.data?.url ?? null);
      router.refresh();
    });
  return (
    <div>
      {message && <Notice tone={message.ok ? "success" : "danger"}>{message.text}</Notice>}
      {url && (
        <div className="mb-4">
          <label htmlFor="feed-url" className="block font-bold">
            Your private calendar address
          </label>
          <input id="feed-url" readOnly value={url} className="mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-slate-50 px-3 font-mono text-sm" onFocus={(event) => event.target.select()} />
          <p className="mt-1 text-sm text-slate-600">Subscribe to it in your calendar app. Anyone with it can read your Guyline events: keep it to yourself.</p>
        </div>
      )}
      {!url && (
        <p className="mb-4 text-slate-700">
          {active ? `You have a calendar address since ${since ? formatInZone(since, timeZone, "date") : "earlier"}. Guyline cannot show it again; make a new one if you lost it.` : "You have no calendar address yet."}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button disabled={pending} onClick={() => run(renewFeedAction)}>
          {active ? "Make a new address (the old one stops)" : "Make my calendar address"}
        </Button>
        {active && (
          <Button variant="secondary" disabled={pending} onClick={() => run(revokeFeedAction)}>
            Stop my calendar feed
          </Button>
        )}
      </div>
    </div>
  );
}
