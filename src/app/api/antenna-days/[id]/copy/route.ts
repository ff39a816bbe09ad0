import { route } from "@/server/api";
import { copyDay } from "@/server/services/antenna-days";
import { copyDaySchema } from "@/validations/antenna-days";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

export const POST = route({ params: idParams, body: copyDaySchema }, async ({ actor, params, body }) =>
  Response.json({ day: await copyDay(actor, params.id, body) }, { status: 201 }),
);
