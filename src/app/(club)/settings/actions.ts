"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { renewFeed, revokeFeed } from "@/server/calendar/feeds";
import { setMailChoices } from "@/server/services/mail-preferences";
import { mailChoicesSchema } from "@/validations/mail";
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

export const updateMailChoicesAction = signedInAction(mailChoicesSchema, async (actor, input) => {
  await setMailChoices(actor, input);
  return { ok: true, message: "Your e-mail choices are saved." };
});

export const renewFeedAction = signedInAction(z.object({}), async (actor) => {
  const url = await renewFeed(actor);
  revalidatePath("/settings");
  return { ok: true, message: "Your calendar address is ready. Copy it now: Guyline keeps only a fingerprint of it.", data: { url } };
});

export const revokeFeedAction = signedInAction(z.object({}), async (actor) => {
  await revokeFeed(actor);
  revalidatePath("/settings");
  return { ok: true, message: "Your calendar address no longer works." };
});
