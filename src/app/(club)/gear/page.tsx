import type { Metadata } from "next";
import { ShelfTable } from "@/components/gear/shelf-table";
import { ButtonLink } from "@/components/ui/button";
import { Card, PageHeader } from "@/components/ui/notice";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Gear shelf" };

export default async function GearShelfPage() {
  const { actor } = await requirePageViewer("gear.view");
  const { timeZone } = await getClubSettings();
  return (
    <>
      <PageHeader title="Gear shelf">
        {can(actor, "gear.manage") && (
          <>
            <ButtonLink href="/gear/new">Add an item</ButtonLink>
            <ButtonLink href="/gear/import" variant="secondary">
              Import a CSV
            </ButtonLink>
            <ButtonLink href="/gear/labels" variant="secondary">
              Print QR labels
            </ButtonLink>
          </>
        )}
      </PageHeader>
      <Card>
        <ShelfTable timeZone={timeZone} />
      </Card>
    </>
  );
}
