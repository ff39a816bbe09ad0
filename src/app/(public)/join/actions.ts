"use server";

import { publicAction } from "@/server/action";
import { joinWithCode } from "@/server/services/accounts";
import { joinSchema } from "@/validations/accounts";

export const joinAction = publicAction(joinSchema, async (input) => {
  await joinWithCode(input);
  return { ok: true };
});
