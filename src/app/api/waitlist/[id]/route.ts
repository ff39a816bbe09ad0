import { z } from "zod";
import { route } from "@/server/api";
import { stepWaitlist } from "@/server/services/lending";
import { waitlistStepSchema } from "@/validations/lending";

const params = z.object({ id: z.uuid("That waitlist entry was not found.") });

export const PATCH = route({ params, body: waitlistStepSchema }, async ({ actor, params, body }) => {
  const { entry, booking, outcome } = await stepWaitlist(actor, params.id, body.action);
  return { entry, booking: booking ?? null, outcome: outcome ?? null };
});
