import { NextResponse } from "next/server";
import { route } from "@/server/api";
import { joinWaitlist } from "@/server/services/lending";
import { waitlistJoinSchema } from "@/validations/lending";

export const POST = route({ body: waitlistJoinSchema }, async ({ actor, body }) => NextResponse.json({ entry: await joinWaitlist(actor, body) }, { status: 201 }));
