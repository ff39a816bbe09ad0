"use server";

import { revalidatePath } from "next/cache";
import { signedInAction } from "@/server/action";
import { changePassword, updateClubSettings, updateProfile } from "@/server/services/accounts";
import { changePasswordSchema, clubSettingsSchema, profileSchema } from "@/validations/accounts";

export const updateProfileAction = signedInAction(profileSchema, async (actor, input) => {
  await updateProfile(actor, input);
  revalidatePath("/", "layout");
  return { ok: true, message: "Your settings are saved." };
});

export const changePasswordAction = signedInAction(changePasswordSchema, async (actor, input) => {
  await changePassword(actor, input);
  return { ok: true, message: "Your password is changed." };
});

export const updateClubSettingsAction = signedInAction(clubSettingsSchema, async (actor, input) => {
  await updateClubSettings(actor, input);
  revalidatePath("/", "layout");
  return { ok: true, message: "The club's settings are saved." };
});
