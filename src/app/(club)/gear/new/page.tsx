import type { Metadata } from "next";
import { ItemForm } from "@/components/gear/item-form";
import { Card, PageHeader } from "@/components/ui/notice";
import { requirePageViewer } from "@/server/session";
import type { GearItemFormValues } from "@/validations/gear";
import { createItemAction } from "../actions";

export const metadata: Metadata = { title: "Add an item" };

const blank = { kind: "coax", labelCode: "", name: "", condition: "good", location: "", notes: "", approvalRule: "", cableType: "rg213", lengthM: "", connectorA: "pl259", connectorB: "pl259" } as GearItemFormValues;

export default async function NewGearItemPage() {
  await requirePageViewer("gear.manage");
  return (
    <>
      <PageHeader title="Add an item to the shelf" />
      <Card>
        <ItemForm action={createItemAction} defaultValues={blank} submitLabel="Add the item" />
      </Card>
    </>
  );
}
