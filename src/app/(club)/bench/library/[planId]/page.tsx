import type { Metadata } from "next";
import Link from "next/link";
import { PlanParameters } from "@/components/antenna-plan/plan-parameters";
import { PlanOffsetsCard } from "@/components/sweeps/plan-offsets";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, PageHeader } from "@/components/ui/notice";
import { formatInZone } from "@/lib/time";
import { loadOrNotFound } from "@/server/page-data";
import { getClubSettings } from "@/server/services/accounts";
import { getLibraryPlan } from "@/server/services/plans";
import { planOffsets } from "@/server/services/sweeps";
import { requirePageViewer } from "@/server/session";
import { LibraryPlanEditor } from "./library-plan-editor";

export const metadata: Metadata = { title: "Library plan" };

export default async function LibraryPlanPage({ params }: { params: Promise<{ planId: string }> }) {
  const { actor, member } = await requirePageViewer("plans.view");
  const { planId } = await params;
  const plan = await loadOrNotFound(planId, (id) => getLibraryPlan(actor, id));
  const [offsets, { timeZone }] = await Promise.all([planOffsets(actor, plan.id), getClubSettings()]);
  return (
    <>
      <PageHeader title={plan.name}>
        <ButtonLink href={`/bench?plan=${plan.id}`}>Open on the antenna bench</ButtonLink>
        <ButtonLink href="/bench/library" variant="secondary">
          Plan library
        </ButtonLink>
      </PageHeader>
      <div className="grid gap-6 lg:grid-cols-2">
        <div>
          <Card title="The plan">
            <PlanParameters parameters={plan.parameters} units={member.units} />
            {plan.notes && <p className="mt-4 whitespace-pre-line text-slate-800">{plan.notes}</p>}
            <p className="mt-4 text-sm text-slate-700">
              Saved by {plan.createdBy?.name ?? "a former member"} on {formatInZone(plan.createdAt, timeZone, "date")}; last changed {formatInZone(plan.updatedAt, timeZone, "date")}.
            </p>
          </Card>
          {plan.canEdit && (
            <Card title="Name and notes">
              <LibraryPlanEditor id={plan.id} name={plan.name} notes={plan.notes} inUse={plan.usageCount > 0} />
            </Card>
          )}
        </div>
        <div>
          <Card title="Where it is used">
            {plan.usage.length === 0 && plan.buildSessions.length === 0 ? (
              <EmptyState title="Nothing uses this plan yet">
                A coordinator can start a slot&apos;s plan from it on the slot&apos;s plan page, or choose it for a build session.
              </EmptyState>
            ) : (
              <>
                {plan.usage.length > 0 && (
                  <ul className="mb-4 space-y-2" aria-label="Station slots using this plan">
                    {plan.usage.map((use) => (
                      <li key={use.slotId}>
                        <Link href={`/antenna-days/${use.dayId}/slots/${use.slotId}/plan`}>{use.slotName}</Link> on{" "}
                        <Link href={`/antenna-days/${use.dayId}`}>{use.dayTitle}</Link> ({formatInZone(use.dayStartsAt, timeZone, "date")}, {use.dayStatus})
                      </li>
                    ))}
                  </ul>
                )}
                {plan.buildSessions.length > 0 && (
                  <ul className="space-y-2" aria-label="Build sessions using this plan">
                    {plan.buildSessions.map((session) => (
                      <li key={session.sessionId}>
                        Build session <Link href={`/build-sessions/${session.sessionId}`}>{session.title}</Link> ({formatInZone(session.startsAt, timeZone, "date")}
                        {session.status === "cancelled" ? ", cancelled" : ""})
                      </li>
                    ))}
                  </ul>
                )}
              </>
            )}
          </Card>
          <Card title="What the sweeps say">
            <PlanOffsetsCard offsets={offsets} planId={plan.id} units={member.units} timeZone={timeZone} />
          </Card>
        </div>
      </div>
    </>
  );
}
