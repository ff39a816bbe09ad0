"use client";
// Choosing a password and being signed in with it: accepting an invitation and resetting a
// forgotten password end the same way.
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import type { ComponentProps } from "react";
import { TextField } from "@/components/ui/field";
import { passwordMinLength } from "@/lib/password-rules";

/** A new-password field with the length rule as its hint. */
export function NewPasswordField(props: Omit<ComponentProps<typeof TextField>, "type" | "autoComplete" | "hint">) {
  return <TextField type="password" autoComplete="new-password" hint={`At least ${passwordMinLength} characters.`} {...props} />;
}

/** Signs the person in with the password they just chose, then opens their home page. */
export function useSignInWithNewPassword(email: string) {
  const router = useRouter();
  return async (password: string) => {
    await signIn("credentials", { redirect: false, email, password });
    router.push("/");
    router.refresh();
  };
}
