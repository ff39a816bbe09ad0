import type { Metadata } from "next";
import Link from "next/link";
import { ClubCalendar } from "@/components/antenna-days/club-calendar";
import { DayStatusBadge } from "@/components/antenna-days/status-badge";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, PageHeader } from "@/components/ui/notice";
import { formatRangeInZone } from "@/lib/time";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { listDays, type DayDto } from "@/server/services/antenna-days";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Antenna days" };

function DayList({ days, timeZone, empty }: { days: DayDto[]; timeZone: string; empty: string }) {
  if (days.length === 0) return <EmptyState title={empty} />;
  return (
    <ul className="divide-y divide-slate-200">
      {days.map((day) => (
        <li key={day.id} className="flex flex-wrap items-center gap-x-3 gap-y-1 py-3">
          <Link href={`/antenna-days/${day.id}`} className="font-bold">
            {day.title}
          </Link>
          <DayStatusBadge status={day.status} />
          <span className="w-full text-sm text-slate-600">
            {formatRangeInZone(day.startsAt, day.endsAt, timeZone)} · {day.site.name}
          </span>
        </li>
      ))}
    </ul>
  );
}

export default async function AntennaDaysPage() {
  const { actor } = await requirePageViewer("antennaDays.view");
  const [days, { timeZone }] = await Promise.all([listDays(actor), getClubSettings()]);
  const now = new Date().toISOString();
  const upcoming = days.filter((day) => day.endsAt >= now);
  const past = days.filter((day) => day.endsAt < now).reverse();
  return (
    <>
      <PageHeader title="Antenna days">
        <ButtonLink href="/sites" variant="secondary">
          Sites
        </ButtonLink>
        {can(actor, "antennaDays.manage") && <ButtonLink href="/antenna-days/new">New antenna day</ButtonLink>}
      </PageHeader>
      <Card title="Calendar">
        <ClubCalendar timeZone={timeZone} />
      </Card>
      <div className="grid gap-6 lg:grid-cols-2">
        <Card title="Coming up">
          <DayList days={upcoming} timeZone={timeZone} empty="No antenna days are planned yet." />
        </Card>
        <Card title="Past days">
          <DayList days={past} timeZone={timeZone} empty="No past antenna days." />
        </Card>
      </div>
    </>
  );
}
