"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { signInSchema } from "@/validations/accounts";

const errorSeparator = "|";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof signInSchema>>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const result = await signIn("credentials", { redirect: false, email: values.email, password: values.password });
    if (result?.ok && !result.error) {
      router.push(callbackUrl);
      router.refresh();
      return;
    }
    const [field, message] = (result?.error ?? "").split(errorSeparator);
    if (message && (field === "email" || field === "password")) setError(field, { type: "server", message });
    else setFormError(message || "Signing in did not work. Try again.");
  });

  return (
    <form onSubmit={onSubmit} noValidate>
      <h1 className="mb-4">Sign in</h1>
      {formError && <Notice tone="danger">{formError}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <TextField label="Password" type="password" autoComplete="current-password" error={formState.errors.password?.message} {...register("password")} />
      <Button type="submit" className="w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
      <p className="mt-4 text-sm text-slate-700">
        <Link href="/reset-password">Forgot your password?</Link>
      </p>
      <p className="mt-2 text-sm text-slate-700">
        New to the club? <Link href="/join">Join with the club&apos;s join code</Link>.
      </p>
    </form>
  );
}
