import type { Metadata } from "next";
import { PlanScreen } from "@/components/antenna-plan/plan-screen";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/notice";
import type { ItuRegion } from "@/lib/antenna/bands";
import { DEFAULT_FORM_VALUES, formOfRequest } from "@/lib/plan-screen/form-values";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { listLibraryPlans } from "@/server/services/plans";
import { requirePageViewer } from "@/server/session";
import { saveToLibraryAction } from "./actions";

export const metadata: Metadata = { title: "Antenna bench" };

export default async function BenchPage({ searchParams }: { searchParams: Promise<{ plan?: string }> }) {
  const { actor, member } = await requirePageViewer("engine.use");
  const [{ ituRegion }, { plan: startPlanId }] = await Promise.all([getClubSettings(), searchParams]);
  const library = can(actor, "plans.view") ? await listLibraryPlans(actor) : [];
  const start = library.find((plan) => plan.id === startPlanId);
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
      <PlanScreen
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
