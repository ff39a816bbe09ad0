import type { Metadata } from "next";
import { PlanScreen } from "@/components/antenna-plan/plan-screen";
import { SweepsSection } from "@/components/sweeps/sweeps-section";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/notice";
import type { ItuRegion } from "@/lib/antenna/bands";
import { DEFAULT_FORM_VALUES, formOfRequest } from "@/lib/plan-screen/form-values";
import { formatInZone } from "@/lib/time";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { listLibraryPlans } from "@/server/services/plans";
import { sweepPageData } from "@/server/services/sweeps";
import { requirePageViewer } from "@/server/session";
import { saveToLibraryAction } from "./actions";

export const metadata: Metadata = { title: "Antenna bench" };

export default async function BenchPage({ searchParams }: { searchParams: Promise<{ plan?: string; sweep?: string }> }) {
  const { actor, member } = await requirePageViewer("engine.use");
  const [{ ituRegion, timeZone }, { plan: startPlanId, sweep: sweepId }] = await Promise.all([getClubSettings(), searchParams]);
  const library = can(actor, "plans.view") ? await listLibraryPlans(actor) : [];
  const start = library.find((plan) => plan.id === startPlanId);
  // A library plan on the bench keeps its measured sweeps: upload, compare and trim here.
  const sweeps = start ? await sweepPageData(actor, { kind: "plan", id: start.id }, sweepId) : null;
  const pagePath = start ? `/bench?plan=${start.id}` : "/bench";
  return (
    <>
      <PageHeader title="Antenna bench">
        <ButtonLink href="/bench/library" variant="secondary">
          Plan library
        </ButtonLink>
      </PageHeader>
      <p className="mb-6 max-w-3xl text-slate-700">
        Try an antenna before an antenna day: choose a family, a band and the site, and the model recomputes as you change them. Save a plan you like to
        the plan library to use it on a station slot.
      </p>
      {start && sweeps && (
        <SweepsSection
          sweeps={sweeps.sweeps}
          selected={sweeps.selected}
          planChanged={sweeps.planChanged}
          access={sweeps.access}
          timeZone={timeZone}
          units={member.units}
          upload={{ uploadUrl: `/api/plans/${start.id}/sweeps`, pagePath, analysers: sweeps.analysers, elements: sweeps.elements, feedline: sweeps.feedline, nowLocal: sweeps.nowLocal }}
        />
      )}
      <PlanScreen
        measured={sweeps?.selected ? { label: `the sweep of ${formatInZone(sweeps.selected.measuredAt, timeZone)}`, views: sweeps.selected.views } : undefined}
        units={member.units}
        region={ituRegion as ItuRegion}
        initialValues={start ? formOfRequest(start.parameters) : DEFAULT_FORM_VALUES}
        initialLibraryPlanId={start?.id ?? null}
        library={library.map(({ id, name, family, parameters }) => ({ id, name, family, parameters }))}
        saveToLibrary={can(actor, "plans.save") ? saveToLibraryAction : undefined}
      />
    </>
  );
}
