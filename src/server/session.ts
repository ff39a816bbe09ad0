// Who is asking: the signed-in person, read fresh from the database on every request.
import { getServerSession } from "next-auth";
import { forbidden as forbiddenPage, redirect } from "next/navigation";
import { cache } from "react";
import { authOptions } from "@/server/auth";
import { can, type Actor, type Permission } from "@/server/policy";
import { findUserById, toActor, toMemberDto, type MemberDto } from "@/server/services/accounts";

export interface Viewer {
  actor: Actor;
  member: MemberDto;
}

/** The signed-in person, once per request; null when signed out or the account is gone. */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (!id) return null;
  const row = await findUserById(id);
  if (!row) return null;
  return { actor: toActor(row), member: toMemberDto(row) };
});

/** For pages: signed-out visitors go to sign-in; a role that may not see the page gets the 403 page. */
export async function requirePageViewer(permission?: Permission): Promise<Viewer> {
  const viewer = await getViewer();
  if (!viewer) redirect("/sign-in");
  if (permission && !can(viewer.actor, permission)) forbiddenPage();
  return viewer;
}
