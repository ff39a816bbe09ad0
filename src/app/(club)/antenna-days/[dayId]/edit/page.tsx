import type { Metadata } from "next";
import { EditDayForm } from "@/components/antenna-days/day-form";
import { Card, Notice, PageHeader } from "@/components/ui/notice";
import { isEditable } from "@/lib/antenna-days/status";
import { loadOrNotFound } from "@/server/page-data";
import { getClubSettings } from "@/server/services/accounts";
import { getDay, listSafetyLeadCandidates } from "@/server/services/antenna-days";
import { listSites } from "@/server/services/sites";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Edit antenna day" };

export default async function EditAntennaDayPage({ params }: { params: Promise<{ dayId: string }> }) {
  const { actor } = await requirePageViewer("antennaDays.manage");
  const { dayId } = await params;
  const day = await loadOrNotFound(dayId, (id) => getDay(actor, id));
  const [sites, leads, { timeZone }] = await Promise.all([listSites(actor), listSafetyLeadCandidates(actor), getClubSettings()]);
  return (
    <>
      <PageHeader title={`Edit ${day.title}`} />
      <Card>
        {isEditable(day.status) ? (
          <EditDayForm
            dayId={day.id}
            choices={{ sites, leads, timeZone }}
            defaults={{ title: day.title, siteId: day.site.id, startsAtLocal: day.startsAtLocal, endsAtLocal: day.endsAtLocal, meetingPoint: day.meetingPoint, description: day.description, safetyLeadId: day.safetyLead.id }}
          />
        ) : (
          <Notice tone="info">This day is {day.status}; it cannot change any more. Copy it to plan a new one.</Notice>
        )}
      </Card>
    </>
  );
}
