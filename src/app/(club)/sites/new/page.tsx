import type { Metadata } from "next";
import { SiteForm } from "@/components/antenna-days/site-form";
import { Card, PageHeader } from "@/components/ui/notice";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "New site" };

export default async function NewSitePage() {
  await requirePageViewer("antennaDays.manage");
  return (
    <>
      <PageHeader title="New site" />
      <Card>
        <SiteForm
          defaults={{ siteId: "", name: "", widthM: 100, depthM: 80, groundClass: "average", groundConductivitySm: "", groundRelativePermittivity: "", notes: "", hazards: [] }}
        />
      </Card>
    </>
  );
}
