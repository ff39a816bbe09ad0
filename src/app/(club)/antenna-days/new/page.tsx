import type { Metadata } from "next";
import { NewDayForm } from "@/components/antenna-days/day-form";
import { Card, EmptyState, PageHeader } from "@/components/ui/notice";
import { ButtonLink } from "@/components/ui/button";
import { getClubSettings } from "@/server/services/accounts";
import { listSafetyLeadCandidates } from "@/server/services/antenna-days";
import { listSites } from "@/server/services/sites";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "New antenna day" };

export default async function NewAntennaDayPage() {
  const { actor } = await requirePageViewer("antennaDays.manage");
  const [sites, leads, { timeZone }] = await Promise.all([listSites(actor), listSafetyLeadCandidates(actor), getClubSettings()]);
  return (
    <>
      <PageHeader title="New antenna day" />
      <Card>
        {sites.length === 0 ? (
          <EmptyState title="Add a site first">
            <ButtonLink href="/sites/new">New site</ButtonLink>
          </EmptyState>
        ) : (
          <NewDayForm
            choices={{ sites, leads, timeZone }}
            defaults={{ title: "", siteId: sites[0].id, startsAtLocal: "", endsAtLocal: "", meetingPoint: "", description: "", safetyLeadId: actor.id }}
          />
        )}
      </Card>
    </>
  );
}
