import type { Metadata } from "next";
import { CopyDayForm } from "@/components/antenna-days/copy-day-form";
import { Card, PageHeader } from "@/components/ui/notice";
import { loadOrNotFound } from "@/server/page-data";
import { getDay } from "@/server/services/antenna-days";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Copy antenna day" };

export default async function CopyAntennaDayPage({ params }: { params: Promise<{ dayId: string }> }) {
  const { actor } = await requirePageViewer("antennaDays.manage");
  const { dayId } = await params;
  const day = await loadOrNotFound(dayId, (id) => getDay(actor, id));
  return (
    <>
      <PageHeader title={`Copy ${day.title}`} />
      <Card>
        <p className="mb-4 text-slate-700">
          The new day starts as a draft at {day.site.name}, with the same meeting point, description, safety lead and every station slot with its antenna plan and place on the site plan. Shifts and
          bookings stay with the old date.
        </p>
        <CopyDayForm sourceId={day.id} defaults={{ title: day.title, startsAtLocal: "", endsAtLocal: "" }} timeZone={day.timeZone} />
      </Card>
    </>
  );
}
