"use client";

import Link from "next/link";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { passwordMinLength } from "@/lib/password-rules";
import { joinSchema } from "@/validations/accounts";
import { joinAction } from "./actions";

export function JoinForm() {
  const router = useRouter();
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(joinSchema, joinAction, {
    onSuccess: async () => {
      const { email, password } = form.getValues();
      await signIn("credentials", { redirect: false, email, password });
      router.push("/");
      router.refresh();
    },
  });
  const { register } = form;
  return (
    <form onSubmit={onSubmit} noValidate>
      <h1 className="mb-2">Join the club on Guyline</h1>
      <p className="mb-4 text-sm text-slate-700">You start as a newcomer; a coordinator confirms you and can change your role.</p>
      {formMessage && <Notice tone={formMessage.ok ? "success" : "danger"}>{formMessage.text}</Notice>}
      <TextField label="Join code" hint="The club's coordinators give it out." autoComplete="off" error={errorOf("joinCode")} {...register("joinCode")} />
      <TextField label="Your name" autoComplete="name" error={errorOf("name")} {...register("name")} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errorOf("email")} {...register("email")} />
      <TextField label="Call sign (optional)" autoComplete="off" error={errorOf("callSign")} {...register("callSign")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${passwordMinLength} characters.`}
        error={errorOf("password")}
        {...register("password")}
      />
      <Button type="submit" className="w-full" disabled={submitting}>
        {submitting ? "Creating your account…" : "Join"}
      </Button>
      <p className="mt-4 text-sm text-slate-700">
        Already have an account? <Link href="/sign-in">Sign in</Link>.
      </p>
    </form>
  );
}
