"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { passwordMinLength } from "@/lib/password-rules";
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
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(resetPasswordSchema, resetPasswordAction, {
    defaultValues: { token },
    onSuccess: async () => {
      await signIn("credentials", { redirect: false, email, password: form.getValues("password") });
      router.push("/");
      router.refresh();
    },
  });
  return (
    <form onSubmit={onSubmit} noValidate>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      {errorOf("token") && <Notice tone="danger">{errorOf("token")}</Notice>}
      <input type="hidden" {...form.register("token")} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${passwordMinLength} characters.`}
        error={errorOf("password")}
        {...form.register("password")}
      />
      <Button type="submit" className="w-full" disabled={submitting}>
        Set my new password
      </Button>
    </form>
  );
}
