"use client";

// The station kits of an antenna day: for each slot, what is booked and what the shelf has that
// suits it. Each slot's suggestions come from GET /api/slots/:id/kit, where the engine computes
// the slot's plan with every candidate coax run; the slots load one after another so a day with
// many slots never floods the engine's queue. A booking refreshes the page; the slot's
// suggestions follow, because what is booked is part of their query key.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useState, useTransition, type ReactNode } from "react";
import { bookKitAction } from "@/app/(club)/antenna-days/[dayId]/kit/actions";
import { StateBadge } from "@/components/gear/badges";
import { detailSummary } from "@/components/gear/describe";
import { BookingSteps } from "@/components/lending/booking-steps";
import { tableClass } from "@/components/antenna-plan/table-class";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { feedlineType } from "@/lib/antenna/feedline-types";
import { gearKindLabels } from "@/lib/gear/kinds";
import type { BookingAction } from "@/lib/lending/states";
import { SAFETY_CAUTIONS } from "@/lib/plan-screen/cautions";
import { formatDistance, formatSwr, type Units } from "@/lib/plan-screen/format";
import { bookedFeedlineText, formatRunLength, type BookedFeedline } from "@/lib/station-kits/booked-feedline";
import type { RunFigures } from "@/lib/station-kits/run-figures";
import type { BookingDto } from "@/server/services/lending";
import type { SlotKit } from "@/server/services/station-kits";

export interface BoardSlot {
  id: string;
  name: string;
  bands: string[];
  runM: number;
  runIsOverride: boolean;
  mastHeightM: number;
  feedline: BookedFeedline | null;
  booked: { booking: BookingDto; steps: BookingAction[]; isBorrower: boolean }[];
}

interface BoardProps {
  slots: BoardSlot[];
  units: Units;
  /** Kit can be booked (the day is open and to come); otherwise the page says why. */
  bookable: boolean;
}

export function StationKitBoard({ slots, units, bookable }: BoardProps) {
  // Slot i loads once slot i − 1 has answered (or failed).
  const [settled, setSettled] = useState<ReadonlySet<string>>(new Set());
  const onSettled = useCallback((slotId: string) => setSettled((done) => (done.has(slotId) ? done : new Set(done).add(slotId))), []);
  return (
    <>
      {slots.map((slot, index) => (
        <SlotKitCard key={slot.id} slot={slot} units={units} bookable={bookable} enabled={index === 0 || settled.has(slots[index - 1].id)} onSettled={onSettled} />
      ))}
    </>
  );
}

function SlotKitCard({ slot, units, bookable, enabled, onSettled }: { slot: BoardSlot; units: Units; bookable: boolean; enabled: boolean; onSettled: (slotId: string) => void }) {
  const bookedKey = slot.booked.map(({ booking }) => `${booking.id}:${booking.state}`).join(",");
  const query = useQuery({
    queryKey: ["station-kit", slot.id, bookedKey],
    enabled,
    queryFn: async (): Promise<SlotKit> => {
      const response = await fetch(`/api/slots/${slot.id}/kit`);
      const body = await response.json();
      if (!response.ok) throw new Error(body.message ?? "The slot's kit could not be loaded.");
      return body.kit;
    },
    // While a booking's refresh recomputes the kit, the last suggestions (and the booking's
    // confirmation above them) stay on screen.
    placeholderData: keepPreviousData,
  });
  const { isPending, isFetching } = query;
  useEffect(() => {
    if (!isPending && !isFetching) onSettled(slot.id);
  }, [isPending, isFetching, onSettled, slot.id]);

  return (
    <section aria-label={`Station kit for ${slot.name}`} aria-busy={isFetching} data-testid={`slot-kit-${slot.name}`} className="mb-6 rounded-xl border border-slate-200 bg-white p-4 shadow-sm sm:p-6">
      <h2 className="mb-1">{slot.name}</h2>
      <p className="text-sm text-slate-700">
        {slot.bands.join(", ")} · feedline run {formatDistance(slot.runM, units)}
        {slot.runIsOverride ? " (set by the coordinator)" : " (tent distance + mast + slack)"} · mast {formatDistance(slot.mastHeightM, units)}
      </p>
      {slot.feedline && (
        <p className="mt-2 font-bold" data-testid="slot-feedline">
          feedline: {bookedFeedlineText(slot.feedline, units)}
        </p>
      )}

      <h3 className="mt-4 mb-1 font-bold">Booked for this slot</h3>
      {slot.booked.length === 0 ? (
        <p className="text-slate-600">Nothing yet.</p>
      ) : (
        <ul className="divide-y divide-slate-200" aria-label={`Booked for ${slot.name}`}>
          {slot.booked.map(({ booking, steps, isBorrower }) => (
            <li key={booking.id} className="py-2" data-testid={`kit-booking-${booking.itemLabelCode}`}>
              <p>
                <StateBadge state={booking.state} /> <span className="font-bold">{booking.itemLabelCode}</span> {booking.itemName} · {gearKindLabels[booking.itemKind]}
                {booking.slotFeedline && " · the slot's feedline"} · {booking.borrowerName}
              </p>
              <BookingSteps booking={booking} steps={steps} isBorrower={isBorrower} />
            </li>
          ))}
        </ul>
      )}

      {query.isError ? (
        <Notice tone="danger" title="The suggestions could not be computed">
          {query.error.message}
        </Notice>
      ) : query.data ? (
        <Suggestions kit={query.data} units={units} bookable={bookable} bookedKinds={new Set(slot.booked.map(({ booking }) => booking.itemKind))} />
      ) : (
        <p className="mt-4 text-sm text-slate-700" role="status">
          {enabled ? `Computing the coax runs for ${slot.name}…` : "Waiting for the slots above…"}
        </p>
      )}
    </section>
  );
}

function bandLines(figures: RunFigures, line: (band: RunFigures["bands"][number]) => string) {
  return figures.bands.map((band) => (
    <span key={band.band} className="block whitespace-nowrap">
      {figures.bands.length > 1 && `${band.band}: `}
      {line(band)}
    </span>
  ));
}

const lossText = (band: RunFigures["bands"][number]) => `${band.totalLossDb.toFixed(2)} dB`;
const swrText = (band: RunFigures["bands"][number]) => `${formatSwr(band.swrAtRadio)} (worst ${formatSwr(band.worstSwrAtRadio)})`;

function Suggestions({ kit, units, bookable, bookedKinds }: { kit: SlotKit; units: Units; bookable: boolean; bookedKinds: ReadonlySet<string> }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, startTransition] = useTransition();
  const book = (itemId: string) =>
    startTransition(async () => {
      const result = await bookKitAction({ slotId: kit.slotId, itemId });
      setMessage({ ok: result.ok, text: result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? "That did not work." });
      if (result.ok) router.refresh();
    });
  const bookButton = (item: { id: string; labelCode: string }) =>
    bookable && (
      <Button variant="secondary" disabled={pending} onClick={() => book(item.id)} aria-label={`Book ${item.labelCode} for ${kit.slotName}`}>
        Book
      </Button>
    );
  const { need, current } = kit;
  const currentRun = current.feedline
    ? `the booked run ${bookedFeedlineText(current.feedline, units)}`
    : `the slot's own run, ${current.figures.feedline.label}, ${formatRunLength(current.figures.feedline.lengthM, units)}`;

  return (
    <div className="mt-4">
      {message && <Notice tone={message.ok ? "success" : "danger"}>{message.text}</Notice>}
      <p className="text-sm" data-testid="current-run">
        The plan uses {currentRun}: loss {current.figures.bands.map((band) => `${band.band} ${lossText(band)}`).join(", ")}; SWR at the radio{" "}
        {current.figures.bands.map((band) => `${band.band} ${formatSwr(band.swrAtRadio)}`).join(", ")}.
      </p>

      {bookable && !current.feedline && (
        <>
          <h3 className="mt-4 mb-1 font-bold">Coax runs</h3>
          {kit.coax.length === 0 ? (
            <p className="text-slate-700">
              No coax run on the shelf suits this slot and is free for the day: it needs {formatRunLength(need.runM, units)} to {formatRunLength(need.longestRunM, units)} of{" "}
              {feedlineType(need.plannedLine).z0Ohms} Ω line.
            </p>
          ) : (
            <div className="overflow-x-auto">
              <table className={tableClass} aria-label={`Coax runs for ${kit.slotName}`}>
                <caption>
                  Coax runs that suit {kit.slotName}, least loss first ({formatRunLength(need.runM, units)} to {formatRunLength(need.longestRunM, units)}, free all day), computed by the
                  engine for each run
                </caption>
                <thead>
                  <tr>
                    <th scope="col">Coax run</th>
                    <th scope="col">Loss at the band centre</th>
                    <th scope="col">SWR at the radio, centre (worst in band)</th>
                    <th scope="col">Whole band under 2:1</th>
                    <th scope="col">
                      <span className="sr-only">Book</span>
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {kit.coax.map(({ item, figures }) => (
                    <tr key={item.id} data-testid={`coax-candidate-${item.labelCode}`}>
                      <th scope="row">
                        <span className="font-bold">{item.labelCode}</span> {item.name}
                        <span className="block font-normal text-slate-700">{detailSummary(item)}</span>
                      </th>
                      <td data-figure="candidate-loss">{bandLines(figures, lossText)}</td>
                      <td data-figure="candidate-swr">{bandLines(figures, swrText)}</td>
                      <td>{bandLines(figures, (band) => (band.fitsUnder2to1 ? "yes" : "no: tuner or trim"))}</td>
                      <td>{bookButton(item)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
        </>
      )}

      {bookable && (
        <div className="mt-4 grid gap-4 md:grid-cols-3">
          <OtherKit title={`Mast, at least ${formatDistance(need.mastHeightM, units)}`} items={kit.mast} bookedAbove={bookedKinds.has("mast")} bookButton={bookButton} note={SAFETY_CAUTIONS.powerLines} />
          <OtherKit title={`Balun or unun, ${need.transformer}, at least ${need.powerW} W`} items={kit.balun} bookedAbove={bookedKinds.has("balun")} bookButton={bookButton} />
          <OtherKit title={`Analyser for ${need.lowMHz}–${need.topMHz} MHz`} items={kit.analyser} bookedAbove={bookedKinds.has("analyser")} bookButton={bookButton} />
        </div>
      )}
    </div>
  );
}

interface OtherKitProps {
  title: string;
  items: SlotKit["mast"];
  bookedAbove: boolean;
  bookButton: (item: { id: string; labelCode: string }) => ReactNode;
  note?: string;
}

function OtherKit({ title, items, bookedAbove, bookButton, note }: OtherKitProps) {
  return (
    <div>
      <h3 className="mb-1 font-bold">{title}</h3>
      {items.length === 0 ? (
        <p className="text-sm text-slate-700">{bookedAbove ? "Booked above." : "None on the shelf suits the slot and is free for the day."}</p>
      ) : (
        <ul className="space-y-2" aria-label={title}>
          {items.map((item) => (
            <li key={item.id} className="flex items-center justify-between gap-2">
              <span className="min-w-0 flex-1">
                <span className="font-bold">{item.labelCode}</span> {item.name}
                <span className="block text-sm text-slate-700">{detailSummary(item)}</span>
              </span>
              {bookButton(item)}
            </li>
          ))}
        </ul>
      )}
      {note && <p className="mt-2 text-sm text-caution-800">{note}</p>}
    </div>
  );
}
