// What the session form offers: the engine's families, bands, feedlines and grounds, and the
// club's mentors.
import type { SessionFormChoices } from "@/components/build-sessions/session-form";
import { FAMILIES, FEEDLINE_TYPES, GROUND_CLASSES, bandsForRegion, type ItuRegion } from "@/lib/antenna";
import { PLAN_MAX_MHZ, PLAN_MIN_MHZ } from "@/lib/antenna/plan-schema";
import type { Actor } from "@/server/policy";
import { mentorCandidates } from "@/server/services/build-sessions";
import { formFamilies } from "@/validations/build-sessions";

export async function sessionFormChoices(actor: Actor, club: { ituRegion: number; timeZone: string }): Promise<SessionFormChoices> {
  const mentors = await mentorCandidates(actor);
  return {
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
