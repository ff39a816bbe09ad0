// What the session form offers: the plans of the plan library it can show, the engine's
// families, bands, feedlines and grounds, and the club's mentors.
import type { SessionFormChoices } from "@/components/build-sessions/session-form";
import { FAMILIES, FEEDLINE_TYPES, GROUND_CLASSES, bandsForRegion, type ItuRegion } from "@/lib/antenna";
import { PLAN_MAX_MHZ, PLAN_MIN_MHZ } from "@/lib/antenna/plan-schema";
import type { Actor } from "@/server/policy";
import { mentorCandidates } from "@/server/services/build-sessions";
import { listLibraryPlans } from "@/server/services/plans";
import { formFamilies, formPlanValues } from "@/validations/build-sessions";

export async function sessionFormChoices(actor: Actor, club: { ituRegion: number; timeZone: string }): Promise<SessionFormChoices> {
  const [mentors, plans] = await Promise.all([mentorCandidates(actor), listLibraryPlans(actor)]);
  return {
    // The form shows single-band families only; fan dipoles from the library go through the API.
    libraryPlans: plans
      .filter((plan) => (formFamilies as readonly string[]).includes(plan.family))
      .map((plan) => ({ value: plan.id, label: plan.name, plan: formPlanValues(club.ituRegion, plan.parameters) })),
    families: FAMILIES.filter((family) => (formFamilies as readonly string[]).includes(family.id)).map((family) => ({ value: family.id, label: family.label })),
    bands: bandsForRegion(club.ituRegion as ItuRegion)
      .filter((band) => band.lowMHz >= PLAN_MIN_MHZ && band.highMHz <= PLAN_MAX_MHZ)
      .map((band) => ({ value: band.name, label: `${band.name} (${band.lowMHz}–${band.highMHz} MHz)` })),
    feedlines: FEEDLINE_TYPES.map((type) => ({ value: type.id, label: type.label })),
    grounds: GROUND_CLASSES.map((ground) => ({ value: ground.id, label: ground.label })),
    mentors: mentors.map((mentor) => ({ value: mentor.id, label: mentor.callSign ? `${mentor.name} (${mentor.callSign})` : mentor.name })),
    timeZone: club.timeZone,
  };
}
