import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PlanScreen } from "@/components/antenna-plan/plan-screen";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/notice";
import { formOfRequest } from "@/lib/plan-screen/form-values";
import { bookedFeedlineText } from "@/lib/station-kits/booked-feedline";
import { can } from "@/server/policy";
import { loadOrNotFound } from "@/server/page-data";
import { listLibraryPlans } from "@/server/services/plans";
import { getSlotWithFeedline } from "@/server/services/station-slots";
import { requirePageViewer } from "@/server/session";
import { saveToLibraryAction } from "@/app/(club)/bench/actions";
import { saveSlotPlanAction } from "./actions";

export const metadata: Metadata = { title: "Station plan" };

export default async function SlotPlanPage({ params }: { params: Promise<{ dayId: string; slotId: string }> }) {
  const { actor, member } = await requirePageViewer("plans.view");
  const { dayId, slotId } = await params;
  const { slot, day, site, region, planRequest, canEdit, feedline } = await loadOrNotFound(slotId, (id) => getSlotWithFeedline(actor, id));
  if (slot.dayId !== dayId) notFound();
  const library = await listLibraryPlans(actor);
  return (
    <>
      <PageHeader title={`${slot.name}: antenna plan`}>
        <ButtonLink href={`/antenna-days/${day.id}/slots/${slot.id}/sheet`} variant="secondary">
          Station sheet
        </ButtonLink>
      </PageHeader>
      <PlanScreen
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
