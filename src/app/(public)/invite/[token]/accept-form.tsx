"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { passwordMinLength } from "@/lib/password-rules";
import { acceptInvitationSchema } from "@/validations/accounts";
import { acceptInvitationAction } from "./actions";

export function AcceptInvitationForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(acceptInvitationSchema, acceptInvitationAction, {
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
      <TextField label="Call sign (optional)" autoComplete="off" error={errorOf("callSign")} {...form.register("callSign")} />
      <TextField
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${passwordMinLength} characters.`}
        error={errorOf("password")}
        {...form.register("password")}
      />
      <Button type="submit" className="w-full" disabled={submitting}>
        Create my account
      </Button>
    </form>
  );
}
