import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PlanScreen } from "@/components/antenna-plan/plan-screen";
import { SweepsSection } from "@/components/sweeps/sweeps-section";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/notice";
import { formOfRequest } from "@/lib/plan-screen/form-values";
import { bookedFeedlineText } from "@/lib/station-kits/booked-feedline";
import { formatInZone } from "@/lib/time";
import { can } from "@/server/policy";
import { loadOrNotFound } from "@/server/page-data";
import { listLibraryPlans } from "@/server/services/plans";
import { getSlotWithFeedline } from "@/server/services/station-slots";
import { sweepPageData } from "@/server/services/sweeps";
import { requirePageViewer } from "@/server/session";
import { saveToLibraryAction } from "@/app/(club)/bench/actions";
import { saveSlotPlanAction } from "./actions";

export const metadata: Metadata = { title: "Antenna plan" };

export default async function SlotPlanPage({ params, searchParams }: { params: Promise<{ dayId: string; slotId: string }>; searchParams: Promise<{ sweep?: string }> }) {
  const { actor, member } = await requirePageViewer("plans.view");
  const [{ dayId, slotId }, { sweep: sweepId }] = await Promise.all([params, searchParams]);
  const { slot, day, site, region, planRequest, canEdit, feedline } = await loadOrNotFound(slotId, (id) => getSlotWithFeedline(actor, id));
  if (slot.dayId !== dayId) notFound();
  const [library, sweeps] = await Promise.all([listLibraryPlans(actor), sweepPageData(actor, { kind: "slot", id: slot.id }, sweepId)]);
  const pagePath = `/antenna-days/${day.id}/slots/${slot.id}/plan`;
  return (
    <>
      <PageHeader title={`${slot.name}: antenna plan`}>
        <ButtonLink href={`/antenna-days/${day.id}/slots/${slot.id}/sheet`} variant="secondary">
          Station sheet
        </ButtonLink>
      </PageHeader>
      <SweepsSection
        sweeps={sweeps.sweeps}
        selected={sweeps.selected}
        planChanged={sweeps.planChanged}
        access={sweeps.access}
        timeZone={day.timeZone}
        units={member.units}
        upload={{ uploadUrl: `/api/slots/${slot.id}/sweeps`, pagePath, analysers: sweeps.analysers, elements: sweeps.elements, feedline: sweeps.feedline, nowLocal: sweeps.nowLocal }}
      />
      <PlanScreen
        measured={sweeps.selected ? { label: `the sweep of ${formatInZone(sweeps.selected.measuredAt, day.timeZone)}`, views: sweeps.selected.views } : undefined}
        units={member.units}
        region={region}
        // The form holds the plan's own line; a booked coax run replaces it only when computing.
        initialValues={formOfRequest({ ...planRequest, feedline: { type: slot.planParams.feedlineType, lengthM: slot.feedlineRun.lengthM } })}
        initialLibraryPlanId={slot.libraryPlanId}
        library={library.map(({ id, name, family, parameters }) => ({ id, name, family, parameters }))}
        slot={{
          slotId: slot.id,
          dayId: day.id,
          slotName: slot.name,
          dayTitle: day.title,
          bands: slot.bands,
          powerW: slot.powerW,
          mode: slot.mode,
          position: [slot.x, slot.y],
          tent: [slot.tentX, slot.tentY],
          feedlineRunOverrideM: slot.feedlineRunOverrideM,
          siteName: site.name,
          siteGround: { groundClass: site.groundClass, groundConductivitySm: site.groundConductivitySm, groundRelativePermittivity: site.groundRelativePermittivity },
          feedline: feedline && { text: bookedFeedlineText(feedline, member.units), type: feedline.cableType, lengthM: feedline.lengthM },
          libraryPlanId: slot.libraryPlanId,
          canSave: canEdit,
          readOnlyReason: can(actor, "antennaDays.manage")
            ? `This day is ${day.status}: its station plans no longer change. Try changes here as you like.`
            : "Try changes here as you like: only a coordinator can save a plan to the slot.",
          saveToSlot: saveSlotPlanAction,
        }}
        saveToLibrary={can(actor, "plans.save") ? saveToLibraryAction : undefined}
      />
    </>
  );
}
