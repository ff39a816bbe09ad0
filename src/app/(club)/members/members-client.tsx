"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { CheckboxField, SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { roleLabels, roles, type Role } from "@/lib/roles";
import type { MemberDto } from "@/server/services/accounts";
import { inviteSchema } from "@/validations/accounts";
import { changeMemberAction, inviteMemberAction } from "./actions";

const roleOptions = roles.map((role) => ({ value: role, label: roleLabels[role] }));

export function InviteForm() {
  const [link, setLink] = useState<string | null>(null);
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(inviteSchema, inviteMemberAction, {
    defaultValues: { role: "member", isMentor: false },
    onSuccess: (result) => {
      const path = (result.data as { invitationPath: string } | undefined)?.invitationPath;
      if (path) setLink(`${window.location.origin}${path}`);
      form.reset({ name: "", email: "", role: "member", isMentor: false });
    },
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Invite someone">
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      {link && (
        <Notice tone="success" title="Invitation link (works once, for 14 days)">
          <code className="break-all">{link}</code>
        </Notice>
      )}
      <div className="grid gap-x-4 sm:grid-cols-2">
        <TextField label="Name" error={errorOf("name")} {...form.register("name")} />
        <TextField label="E-mail" type="email" error={errorOf("email")} {...form.register("email")} />
        <SelectField label="Role" options={roleOptions} error={errorOf("role")} {...form.register("role")} />
        <div className="pt-7">
          <CheckboxField label="Mentor" {...form.register("isMentor")} />
        </div>
      </div>
      <Button type="submit" disabled={submitting}>
        Invite
      </Button>
    </form>
  );
}

export function MemberRow({ member, isSelf }: { member: MemberDto; isSelf: boolean }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<string | null>(null);

  const change = (patch: { role?: Role; isMentor?: boolean; confirm?: boolean }) =>
    startTransition(async () => {
      const result = await changeMemberAction({ userId: member.id, ...patch });
      setMessage(result.ok ? null : (result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? "That did not work."));
      router.refresh();
    });

  return (
    <tr className="border-t border-slate-200 align-top" data-testid={`member-${member.email}`}>
      <td className="py-2 pr-3">
        <p className="font-bold">{member.name}</p>
        <p className="text-sm text-slate-600">
          {member.email}
          {member.callSign ? ` · ${member.callSign}` : ""}
        </p>
        {message && (
          <p role="alert" className="text-sm font-bold text-danger-600">
            {message}
          </p>
        )}
      </td>
      <td className="py-2 pr-3">
        <label className="sr-only" htmlFor={`role-${member.id}`}>
          Role of {member.name}
        </label>
        <select
          id={`role-${member.id}`}
          className="min-h-11 rounded-lg border border-slate-400 bg-white px-2"
          value={member.role}
          disabled={pending}
          onChange={(event) => change({ role: event.target.value as Role })}
        >
          {roleOptions.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      </td>
      <td className="py-2 pr-3">
        <label className="flex min-h-11 items-center gap-2">
          <input
            type="checkbox"
            className="size-5 accent-copper-700"
            checked={member.isMentor}
            disabled={pending || member.role === "newcomer"}
            onChange={(event) => change({ isMentor: event.target.checked })}
          />
          <span className="sr-only">Mentor: {member.name}</span>
          {member.isMentor ? "Mentor" : ""}
        </label>
      </td>
      <td className="py-2">
        {member.confirmed ? (
          <span className="text-slate-600">{isSelf ? "You" : "Confirmed"}</span>
        ) : (
          <Button variant="secondary" disabled={pending} onClick={() => change({ confirm: true })}>
            Confirm {member.name.split(" ")[0]}
          </Button>
        )}
      </td>
    </tr>
  );
}
