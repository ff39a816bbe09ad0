"use client";

import { NewPasswordField, useSignInWithNewPassword } from "@/components/forms/new-password";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { acceptInvitationSchema } from "@/validations/accounts";
import { acceptInvitationAction } from "./actions";

export function AcceptInvitationForm({ token, email }: { token: string; email: string }) {
  const signInWith = useSignInWithNewPassword(email);
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(acceptInvitationSchema, acceptInvitationAction, {
    defaultValues: { token },
    onSuccess: () => signInWith(form.getValues("password")),
  });
  return (
    <form onSubmit={onSubmit} noValidate>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      {errorOf("token") && <Notice tone="danger">{errorOf("token")}</Notice>}
      <input type="hidden" {...form.register("token")} />
      <TextField label="Call sign (optional)" autoComplete="off" error={errorOf("callSign")} {...form.register("callSign")} />
      <NewPasswordField label="Choose a password" error={errorOf("password")} {...form.register("password")} />
      <Button type="submit" className="w-full" disabled={submitting}>
        Create my account
      </Button>
    </form>
  );
}
