import { z } from "zod";
import { optionalMailCategories, type OptionalMailCategory } from "@/lib/mail/categories";
import { emailField, passwordField } from "@/validations/accounts";

export const mailChoicesSchema = z.object(
  Object.fromEntries(optionalMailCategories.map((category) => [category, z.coerce.boolean()])) as Record<OptionalMailCategory, z.ZodCoercedBoolean>,
);

export const signInHelpSchema = z.object({ email: emailField });

export const resetPasswordSchema = z.object({
  token: z.string().min(20, "This link is incomplete."),
  password: passwordField,
});

export const unsubscribeSchema = z.object({
  token: z.string().min(10, "This link is incomplete."),
  subscribe: z.boolean(),
});
