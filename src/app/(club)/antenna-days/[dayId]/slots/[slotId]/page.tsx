import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SlotForm } from "@/components/antenna-days/slot-form";
import { ButtonLink } from "@/components/ui/button";
import { Card, Notice, PageHeader } from "@/components/ui/notice";
import type { ItuRegion } from "@/lib/antenna/bands";
import { isEditable } from "@/lib/antenna-days/status";
import { loadOrNotFound } from "@/server/page-data";
import { getClubSettings } from "@/server/services/accounts";
import { getDay } from "@/server/services/antenna-days";
import { getSite } from "@/server/services/sites";
import { getSlot } from "@/server/services/station-slots";
import { requirePageViewer } from "@/server/session";
import { planBandNames, slotFormValues } from "@/validations/slot-form";

export const metadata: Metadata = { title: "Station slot" };

export default async function EditSlotPage({ params }: { params: Promise<{ dayId: string; slotId: string }> }) {
  const { actor } = await requirePageViewer("antennaDays.manage");
  const { dayId, slotId } = await params;
  const slot = await loadOrNotFound(slotId, (id) => getSlot(actor, id));
  if (slot.dayId !== dayId) notFound();
  const day = await getDay(actor, dayId);
  const [site, { ituRegion }] = await Promise.all([getSite(actor, day.site.id), getClubSettings()]);
  return (
    <>
      <PageHeader title={`${slot.name}, ${day.title}`}>
        <ButtonLink href={`/antenna-days/${day.id}/slots/${slot.id}/plan`} variant="secondary">
          Antenna plan
        </ButtonLink>
      </PageHeader>
      <Card>
        {isEditable(day.status) ? (
          <SlotForm dayId={day.id} slotId={slot.id} bandNames={planBandNames(ituRegion as ItuRegion)} site={site} defaults={slotFormValues(day.id, slot, site)} />
        ) : (
          <Notice tone="info">This day is {day.status}; its station slots cannot change any more.</Notice>
        )}
      </Card>
    </>
  );
}
