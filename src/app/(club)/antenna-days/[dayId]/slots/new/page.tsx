import type { Metadata } from "next";
import { SlotForm } from "@/components/antenna-days/slot-form";
import { Card, Notice, PageHeader } from "@/components/ui/notice";
import type { ItuRegion } from "@/lib/antenna/bands";
import { isEditable } from "@/lib/antenna-days/status";
import { loadOrNotFound } from "@/server/page-data";
import { getClubSettings } from "@/server/services/accounts";
import { getDay } from "@/server/services/antenna-days";
import { getSite } from "@/server/services/sites";
import { requirePageViewer } from "@/server/session";
import { planBandNames, slotFormValues } from "@/validations/slot-form";

export const metadata: Metadata = { title: "New station slot" };

export default async function NewSlotPage({ params }: { params: Promise<{ dayId: string }> }) {
  const { actor } = await requirePageViewer("antennaDays.manage");
  const { dayId } = await params;
  const day = await loadOrNotFound(dayId, (id) => getDay(actor, id));
  const [site, { ituRegion }] = await Promise.all([getSite(actor, day.site.id), getClubSettings()]);
  return (
    <>
      <PageHeader title={`New station slot for ${day.title}`} />
      <Card>
        {isEditable(day.status) ? (
          <SlotForm dayId={day.id} slotId={null} bandNames={planBandNames(ituRegion as ItuRegion)} site={site} defaults={slotFormValues(day.id, null, site)} />
        ) : (
          <Notice tone="info">This day is {day.status}; its station slots cannot change any more.</Notice>
        )}
      </Card>
    </>
  );
}
