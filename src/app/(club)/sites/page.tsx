import type { Metadata } from "next";
import Link from "next/link";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, PageHeader } from "@/components/ui/notice";
import { groundLabel } from "@/components/antenna-days/ground-label";
import { can } from "@/server/policy";
import { listSites } from "@/server/services/sites";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Sites" };

export default async function SitesPage() {
  const { actor } = await requirePageViewer("antennaDays.view");
  const sites = await listSites(actor);
  return (
    <>
      <PageHeader title="Sites">
        <ButtonLink href="/antenna-days" variant="secondary">
          Antenna days
        </ButtonLink>
        {can(actor, "antennaDays.manage") && <ButtonLink href="/sites/new">New site</ButtonLink>}
      </PageHeader>
      <Card>
        {sites.length === 0 ? (
          <EmptyState title="No sites yet." />
        ) : (
          <ul className="divide-y divide-slate-200">
            {sites.map((site) => (
              <li key={site.id} className="py-3">
                <Link href={`/sites/${site.id}`} className="font-bold">
                  {site.name}
                </Link>
                <p className="text-sm text-slate-600">
                  {site.widthM} × {site.depthM} m · {groundLabel(site)} · {site.hazards.length} {site.hazards.length === 1 ? "hazard" : "hazards"} marked
                </p>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </>
  );
}
