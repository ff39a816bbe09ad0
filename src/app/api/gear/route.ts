import { NextResponse } from "next/server";
import { route } from "@/server/api";
import { createItem, exportItemsCsv, listItems } from "@/server/services/gear";
import { gearItemSchema, gearListQuerySchema } from "@/validations/gear";
import { csvResponse } from "@/server/csv-response";

export const GET = route({ query: gearListQuerySchema }, async ({ actor, query }) =>
  query.format === "csv" ? csvResponse(await exportItemsCsv(actor, query), "gear-shelf") : listItems(actor, query),
);

export const POST = route({ body: gearItemSchema }, async ({ actor, body }) => NextResponse.json({ item: await createItem(actor, body) }, { status: 201 }));
