// "What needs me next": the few things on the home page that wait for this person.
// Each area of Guyline adds its own source here.
import { and, count, isNull } from "drizzle-orm";
import { db } from "@/server/db";
import { users } from "@/server/db/schema";
import { can, type Actor } from "@/server/policy";
import { lendingHomeSections } from "@/server/services/lending";

export interface NextThing {
  title: string;
  detail?: string;
  href: string;
}

export interface HomeSection {
  heading: string;
  /** Shown when the section has nothing in it. */
  emptyText: string;
  things: NextThing[];
}

async function membersAwaitingConfirmation(actor: Actor): Promise<HomeSection | null> {
  if (!can(actor, "members.manage")) return null;
  const [{ waiting }] = await db().select({ waiting: count() }).from(users).where(and(isNull(users.confirmedAt)));
  return {
    heading: "People waiting for you",
    emptyText: "Nobody is waiting to be confirmed.",
    things: waiting > 0 ? [{ title: `${waiting} ${waiting === 1 ? "person joined and waits" : "people joined and wait"} for confirmation`, href: "/members" }] : [],
  };
}

export async function whatNeedsMeNext(actor: Actor): Promise<HomeSection[]> {
  const sections = await Promise.all([membersAwaitingConfirmation(actor), lendingHomeSections(actor)]);
  return sections.flat().filter((section): section is HomeSection => section !== null);
}
