"use server";

import { publicAction } from "@/server/action";
import { acceptInvitation } from "@/server/services/accounts";
import { acceptInvitationSchema } from "@/validations/accounts";

export const acceptInvitationAction = publicAction(acceptInvitationSchema, async (input) => {
  const member = await acceptInvitation(input);
  return { ok: true, data: { email: member.email } };
});
