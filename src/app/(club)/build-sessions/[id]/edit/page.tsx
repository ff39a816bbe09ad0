import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SessionForm } from "@/components/build-sessions/session-form";
import { Card, PageHeader } from "@/components/ui/notice";
import { PublicError } from "@/server/errors";
import { getClubSettings } from "@/server/services/accounts";
import { getBuildSession } from "@/server/services/build-sessions";
import { requirePageViewer } from "@/server/session";
import { formPlanValues } from "@/validations/build-sessions";
import { updateBuildSessionAction } from "../../actions";
import { sessionFormChoices } from "../../form-choices";

export const metadata: Metadata = { title: "Change a build session" };

export default async function EditBuildSessionPage({ params }: { params: Promise<{ id: string }> }) {
  const { actor } = await requirePageViewer("buildSessions.manage");
  const { id } = await params;
  const club = await getClubSettings();
  const session = await getBuildSession(actor, id).catch((error: unknown) => {
    if (error instanceof PublicError && error.status === 404) notFound();
    throw error;
  });
  const choices = await sessionFormChoices(actor, club);
  return (
    <>
      <PageHeader title={`Change: ${session.title}`} />
      <Card>
        <SessionForm
          choices={choices}
          action={updateBuildSessionAction}
          submitLabel="Save the changes"
          defaults={{
            id: session.id,
            title: session.title,
            place: session.place,
            startsAt: session.startsAtWall,
            endsAt: session.endsAtWall,
            capacity: session.capacity,
            raisesMast: session.raisesMast,
            mentorIds: session.mentors.map((mentor) => mentor.id),
            notes: session.notes ?? "",
            libraryPlanId: session.libraryPlanId ?? "",
            antennaDayId: session.antennaDayId,
            plan: formPlanValues(club.ituRegion, session.plan),
          }}
        />
      </Card>
    </>
  );
}
