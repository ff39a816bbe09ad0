"use server";

import { revalidatePath } from "next/cache";
import { signedInAction } from "@/server/action";
import { changeMember, inviteMember } from "@/server/services/accounts";
import { inviteSchema, memberChangeSchema } from "@/validations/accounts";

export const inviteMemberAction = signedInAction(inviteSchema, async (actor, input) => {
  const { token } = await inviteMember(actor, input);
  revalidatePath("/members");
  return { ok: true, message: `${input.name} is invited; the invitation is on its way by e-mail.`, data: { invitationPath: `/invite/${token}` } };
});

export const changeMemberAction = signedInAction(memberChangeSchema, async (actor, input) => {
  const member = await changeMember(actor, input);
  revalidatePath("/members");
  return { ok: true, message: `${member.name} is updated.` };
});
