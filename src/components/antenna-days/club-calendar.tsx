"use client";

import FullCalendar from "@fullcalendar/react";
import dayGridPlugin from "@fullcalendar/react/daygrid";
import listPlugin from "@fullcalendar/react/list";
import classicThemePlugin from "@fullcalendar/react/themes/classic";
import "@fullcalendar/react/skeleton.css";
import "@fullcalendar/react/themes/classic/theme.css";
import "./club-calendar.css";
import { useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useSyncExternalStore, useState } from "react";
import { Notice } from "@/components/ui/notice";
import type { CalendarEntry, CalendarKind } from "@/server/services/calendar";

interface CalendarAnswer {
  kinds: CalendarKind[];
  entries: CalendarEntry[];
}

async function fetchEntries(from: string, to: string): Promise<CalendarAnswer> {
  const response = await fetch(`/api/calendar-entries?${new URLSearchParams({ from, to })}`);
  if (!response.ok) throw new Error((await response.json().catch(() => null))?.message ?? "The calendar could not be loaded.");
  return response.json();
}

// Phones get the list view: a month grid is unreadable at that width.
const narrowQuery = "(max-width: 639px)";
const subscribeNarrow = (onChange: () => void) => {
  const media = window.matchMedia(narrowQuery);
  media.addEventListener("change", onChange);
  return () => media.removeEventListener("change", onChange);
};

/** The club calendar: antenna days, the person's shifts and the other kinds, fetched for the visible range. */
export function ClubCalendar({ timeZone }: { timeZone: string }) {
  const router = useRouter();
  const narrow = useSyncExternalStore(subscribeNarrow, () => window.matchMedia(narrowQuery).matches, () => false);
  const [range, setRange] = useState<{ from: string; to: string } | null>(null);
  const query = useQuery({
    queryKey: ["calendar-entries", range?.from, range?.to],
    queryFn: () => fetchEntries(range!.from, range!.to),
    enabled: range !== null,
    placeholderData: (previous) => previous,
  });
  const kinds = new Map((query.data?.kinds ?? []).map((kind) => [kind.kind, kind]));
  const events = (query.data?.entries ?? []).map((entry) => {
    const colour = kinds.get(entry.kind)?.colour;
    return { id: entry.id, title: entry.title, start: entry.start, end: entry.end, allDay: entry.allDay, url: entry.href, backgroundColor: colour, borderColor: colour, textColor: "#ffffff" };
  });

  return (
    <div>
      {query.error && <Notice tone="danger">{query.error.message}</Notice>}
      <div className="guyline-calendar">
        <FullCalendar
          key={narrow ? "list" : "grid"}
          plugins={[dayGridPlugin, listPlugin, classicThemePlugin]}
          initialView={narrow ? "listMonth" : "dayGridMonth"}
          headerToolbar={{ start: "title", end: narrow ? "today prev,next" : "today prev,next dayGridMonth,listMonth" }}
          buttons={{ dayGridMonth: { text: "Month" }, listMonth: { text: "List" } }}
          timeZone={timeZone}
          firstDay={1}
          eventTimeFormat={{ hour: "2-digit", minute: "2-digit", hour12: false }}
          listItemEventTitleClass="guyline-calendar-title"
          listItemEventInnerClass="guyline-calendar-title"
          height="auto"
          events={events}
          noEventsText="Nothing on the calendar this month."
          datesSet={(info) => setRange({ from: info.start.toISOString(), to: info.end.toISOString() })}
          eventClick={(info) => {
            info.jsEvent.preventDefault();
            if (info.event.url) router.push(info.event.url);
          }}
        />
      </div>
      {query.data && (
        <ul aria-label="Legend" className="mt-3 flex flex-wrap gap-4 text-sm">
          {query.data.kinds.map((kind) => (
            <li key={kind.kind} className="flex items-center gap-2">
              <span aria-hidden="true" className="inline-block size-4 rounded" style={{ backgroundColor: kind.colour }} />
              {kind.label}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
