"use server";

import { publicAction } from "@/server/action";
import { badInput } from "@/server/errors";
import { applyUnsubscribeToken } from "@/server/services/mail-preferences";
import { unsubscribeSchema } from "@/validations/mail";

export const unsubscribeAction = publicAction(unsubscribeSchema, async (input) => {
  const claim = await applyUnsubscribeToken(input.token, input.subscribe);
  if (!claim) throw badInput("token", "This link is not valid any more.");
  return { ok: true };
});
