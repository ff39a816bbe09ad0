import type { Metadata } from "next";
import { SessionForm } from "@/components/build-sessions/session-form";
import { Card, PageHeader } from "@/components/ui/notice";
import { getClubSettings } from "@/server/services/accounts";
import { requirePageViewer } from "@/server/session";
import { formPlanValues } from "@/validations/build-sessions";
import { createBuildSessionAction } from "../actions";
import { sessionFormChoices } from "../form-choices";

export const metadata: Metadata = { title: "Schedule a build session" };

export default async function NewBuildSessionPage() {
  const { actor } = await requirePageViewer("buildSessions.manage");
  const club = await getClubSettings();
  const choices = await sessionFormChoices(actor, club);
  return (
    <>
      <PageHeader title="Schedule a build session" />
      <Card>
        <SessionForm
          choices={choices}
          action={createBuildSessionAction}
          submitLabel="Schedule the session"
          defaults={{ title: "", place: "", startsAt: "", endsAt: "", capacity: 6, raisesMast: false, mentorIds: [], notes: "", libraryPlanId: "", plan: formPlanValues(club.ituRegion) }}
        />
      </Card>
    </>
  );
}
