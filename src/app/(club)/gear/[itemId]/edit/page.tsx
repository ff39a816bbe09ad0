import type { Metadata } from "next";
import { ItemForm } from "@/components/gear/item-form";
import { Card, Notice, PageHeader } from "@/components/ui/notice";
import { loadOrNotFound } from "@/server/page-data";
import { getItem } from "@/server/services/gear";
import { requirePageViewer } from "@/server/session";
import type { GearItemFormValues } from "@/validations/gear";
import { updateItemAction } from "../../actions";

export const metadata: Metadata = { title: "Edit an item" };

export default async function EditGearItemPage({ params }: { params: Promise<{ itemId: string }> }) {
  const { actor } = await requirePageViewer("gear.manage");
  const { itemId } = await params;
  const item = await loadOrNotFound(itemId, (id) => getItem(actor, id));
  // Form inputs hold text: numbers and empty values become strings, a retired item asks for a condition.
  const values = Object.fromEntries(Object.entries(item).map(([key, value]) => [key, value === null ? "" : String(value)]));
  const defaults = { ...values, condition: item.condition === "retired" ? "" : item.condition } as GearItemFormValues;
  return (
    <>
      <PageHeader title={`Edit ${item.labelCode}`} />
      {item.retiredAt && <Notice tone="info">This item is retired. Choose a condition and save to bring it back onto the shelf.</Notice>}
      <Card>
        <ItemForm action={updateItemAction.bind(null, item.id)} defaultValues={defaults} submitLabel="Save the item" />
      </Card>
    </>
  );
}
