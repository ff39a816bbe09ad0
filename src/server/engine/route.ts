// The HTTP side of the engine's two contract calls: signed-in people with `engine.use`, any
// JSON body (the engine validates it, so problems carry the contract's paths such as
// `wires[1].diameterMm`), 400 with the list of problems on bad input.
import { z } from "zod";
import { EngineInputError } from "@/lib/antenna/problems";
import { badRequest, route } from "@/server/api";
import { forbidden } from "@/server/errors";
import { can } from "@/server/policy";
import { engineProblems } from "./run";

export function engineRoute(call: (request: unknown) => Promise<unknown>) {
  return route({ body: z.unknown() }, async ({ actor, body }) => {
    if (!can(actor, "engine.use")) throw forbidden();
    try {
      return await call(body);
    } catch (error) {
      if (error instanceof EngineInputError) return badRequest(engineProblems(error));
      throw error;
    }
  });
}
