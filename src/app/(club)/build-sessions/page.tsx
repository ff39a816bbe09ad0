import type { Metadata } from "next";
import Link from "next/link";
import { PlacesBadge } from "@/components/build-sessions/places";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, PageHeader } from "@/components/ui/notice";
import { formatRangeInZone } from "@/lib/time";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { listBuildSessions } from "@/server/services/build-sessions";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Build sessions" };

export default async function BuildSessionsPage() {
  const { actor } = await requirePageViewer("buildSessions.view");
  const [sessions, club] = await Promise.all([listBuildSessions(actor), getClubSettings()]);
  return (
    <>
      <PageHeader title="Build sessions">{can(actor, "buildSessions.manage") && <ButtonLink href="/build-sessions/new">Schedule a build session</ButtonLink>}</PageHeader>
      <p className="mb-6 max-w-3xl text-slate-700">
        Build and tune your first antenna beside a mentor. Each session builds one antenna plan: the page lists the materials, the cut sheet, what to bring and the safety notes. Times are {club.timeZone} time.
      </p>
      {sessions.length === 0 && <EmptyState title="No build sessions are scheduled yet." />}
      <ul className="grid gap-4 md:grid-cols-2">
        {sessions.map((session) => (
          <li key={session.id}>
            <Card>
              <h2>
                <Link href={`/build-sessions/${session.id}`}>{session.title}</Link>
              </h2>
              <p className="text-slate-700">{formatRangeInZone(session.startsAt, session.endsAt, club.timeZone)}</p>
              <p className="text-slate-700">{session.place}</p>
              <p className="text-sm text-slate-600">
                {session.antennaLabel}
                {session.mentors.length > 0 && ` · mentors ${session.mentors.map((mentor) => mentor.name).join(", ")}`}
              </p>
              <div className="mt-2">
                <PlacesBadge session={session} />
              </div>
            </Card>
          </li>
        ))}
      </ul>
    </>
  );
}
