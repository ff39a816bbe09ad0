"use client";

import Link from "next/link";
import { NewPasswordField, useSignInWithNewPassword } from "@/components/forms/new-password";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { resetPasswordSchema, signInHelpSchema } from "@/validations/mail";
import { requestSignInHelpAction, resetPasswordAction } from "./actions";

export function RequestSignInHelpForm() {
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(signInHelpSchema, requestSignInHelpAction);
  return (
    <form onSubmit={onSubmit} noValidate>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="email" error={errorOf("email")} {...form.register("email")} />
      <Button type="submit" className="w-full" disabled={submitting}>
        Send me a link
      </Button>
      <p className="mt-4 text-sm">
        <Link href="/sign-in">Back to sign in</Link>
      </p>
    </form>
  );
}

export function ResetPasswordForm({ token, email }: { token: string; email: string }) {
  const signInWith = useSignInWithNewPassword(email);
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(resetPasswordSchema, resetPasswordAction, {
    defaultValues: { token },
    onSuccess: () => signInWith(form.getValues("password")),
  });
  return (
    <form onSubmit={onSubmit} noValidate>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      {errorOf("token") && <Notice tone="danger">{errorOf("token")}</Notice>}
      <input type="hidden" {...form.register("token")} />
      <NewPasswordField label="New password" error={errorOf("password")} {...form.register("password")} />
      <Button type="submit" className="w-full" disabled={submitting}>
        Set my new password
      </Button>
    </form>
  );
}
