"use server";

import { headers } from "next/headers";
import { publicAction } from "@/server/action";
import { clientAddressFrom } from "@/server/auth";
import { requestSignInHelp, resetPassword } from "@/server/services/sign-in-help";
import { resetPasswordSchema, signInHelpSchema } from "@/validations/mail";

export const requestSignInHelpAction = publicAction(signInHelpSchema, async (input) => {
  await requestSignInHelp({ email: input.email, clientAddress: clientAddressFrom(await headers()) });
  // The same answer whether or not the address has an account.
  return { ok: true, message: "If a Guyline account uses this address, a link to choose a new password is on its way. It works once, for an hour." };
});

export const resetPasswordAction = publicAction(resetPasswordSchema, async (input) => {
  const { email } = await resetPassword(input);
  return { ok: true, message: "Your new password is set. Sign in with it.", data: { email } };
});
