import type { Metadata } from "next";
import { groundLabel } from "@/components/antenna-days/ground-label";
import { SiteForm } from "@/components/antenna-days/site-form";
import { SitePlan } from "@/components/antenna-days/site-plan";
import { Card, PageHeader } from "@/components/ui/notice";
import { hazardKindLabels } from "@/lib/site-plan/hazards";
import { loadOrNotFound } from "@/server/page-data";
import { can } from "@/server/policy";
import { getSite } from "@/server/services/sites";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Site" };

const pointsText = (points: readonly (readonly number[])[]) => points.map((point) => point.join(",")).join("; ");

export default async function SitePage({ params }: { params: Promise<{ siteId: string }> }) {
  const { actor } = await requirePageViewer("antennaDays.view");
  const { siteId } = await params;
  const site = await loadOrNotFound(siteId, (id) => getSite(actor, id));
  if (can(actor, "antennaDays.manage")) {
    return (
      <>
        <PageHeader title={site.name} />
        <Card>
          <SiteForm
            defaults={{
              siteId: site.id,
              name: site.name,
              widthM: site.widthM,
              depthM: site.depthM,
              groundClass: site.groundClass,
              groundConductivitySm: site.groundConductivitySm === null ? "" : String(site.groundConductivitySm),
              groundRelativePermittivity: site.groundRelativePermittivity === null ? "" : String(site.groundRelativePermittivity),
              notes: site.notes,
              hazards: site.hazards.map((hazard) => ({ kind: hazard.kind, label: hazard.label, pointsText: pointsText(hazard.points), heightM: "heightM" in hazard ? String(hazard.heightM) : "" })),
            }}
          />
        </Card>
      </>
    );
  }
  return (
    <>
      <PageHeader title={site.name} />
      <Card>
        <p className="mb-2">
          {site.widthM} × {site.depthM} m, {groundLabel(site)}.
        </p>
        {site.notes && <p className="mb-3 whitespace-pre-line">{site.notes}</p>}
        <ul className="mb-4 list-disc pl-5 text-sm">
          {site.hazards.map((hazard, index) => (
            <li key={index}>
              {hazardKindLabels[hazard.kind]}: {hazard.label}
              {"heightM" in hazard && `, ${hazard.heightM} m high`}
            </li>
          ))}
        </ul>
        <SitePlan site={site} slots={[]} editable={false} />
      </Card>
    </>
  );
}
