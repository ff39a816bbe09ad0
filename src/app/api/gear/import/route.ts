import { NextResponse } from "next/server";
import { route } from "@/server/api";
import { importItems } from "@/server/services/gear";
import { importSchema } from "@/validations/gear";

/** Preview or commit a CSV of items; a commit with any problem imports nothing and answers 400. */
export const POST = route({ body: importSchema }, async ({ actor, body }) => {
  const outcome = await importItems(actor, body);
  if (body.mode === "commit" && outcome.problems.length > 0) {
    return NextResponse.json(
      { error: "bad-input", message: `Nothing was imported: the file has ${outcome.problems.length} problem${outcome.problems.length === 1 ? "" : "s"}.`, ...outcome },
      { status: 400 },
    );
  }
  return outcome;
});
