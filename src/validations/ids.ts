import { z } from "zod";

/** `[id]` route segments: a uuid (anything else is a 400 naming `id`). */
export const idParams = z.object({ id: z.uuid("must be an id (uuid)") });
