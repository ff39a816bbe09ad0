import type { Metadata } from "next";
import Link from "next/link";
import { bandsOf, familyLabel } from "@/components/antenna-plan/plan-parameters";
import { tableClass } from "@/components/antenna-plan/table-class";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, PageHeader } from "@/components/ui/notice";
import { formatDistance } from "@/lib/plan-screen/format";
import { listLibraryPlans } from "@/server/services/plans";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Plan library" };

export default async function PlanLibraryPage() {
  const { actor, member } = await requirePageViewer("plans.view");
  const plans = await listLibraryPlans(actor);
  return (
    <>
      <PageHeader title="Plan library">
        <ButtonLink href="/bench" variant="secondary">
          Antenna bench
        </ButtonLink>
      </PageHeader>
      <p className="mb-6 max-w-3xl text-slate-700">
        Antenna plans saved to reuse: open one on the antenna bench, start a station slot&apos;s plan from it, or build it at a build session. Each shows the station slots and build sessions that use it.
      </p>
      <Card>
        {plans.length === 0 ? (
          <EmptyState title="No saved plans yet">Save a plan from the antenna bench or a station slot&apos;s plan page.</EmptyState>
        ) : (
          <div className="overflow-x-auto">
            <table className={tableClass}>
              <caption className="sr-only">Saved antenna plans</caption>
              <thead>
                <tr>
                  <th scope="col">Name</th>
                  <th scope="col">Family</th>
                  <th scope="col">Band</th>
                  <th scope="col">Height</th>
                  <th scope="col">Saved by</th>
                  <th scope="col">Used in</th>
                </tr>
              </thead>
              <tbody>
                {plans.map((plan) => (
                  <tr key={plan.id}>
                    <th scope="row">
                      <Link href={`/bench/library/${plan.id}`}>{plan.name}</Link>
                    </th>
                    <td>{familyLabel(plan.family)}</td>
                    <td>{bandsOf(plan.parameters)}</td>
                    <td>{formatDistance(plan.parameters.heightM, member.units)}</td>
                    <td>{plan.createdBy?.name ?? "—"}</td>
                    <td>{plan.usageCount === 0 ? "not used yet" : `${plan.usageCount} place${plan.usageCount === 1 ? "" : "s"}`}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </Card>
    </>
  );
}
