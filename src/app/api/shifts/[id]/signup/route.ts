import { route } from "@/server/api";
import { cancelSignUp, signUp } from "@/server/services/shifts";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

/** Signs the signed-in person up for the shift. */
export const POST = route({ params: idParams }, async ({ actor, params }) => ({ shift: await signUp(actor, params.id) }));

/** Cancels the signed-in person's own sign-up. */
export const DELETE = route({ params: idParams }, async ({ actor, params }) => ({ shift: await cancelSignUp(actor, params.id) }));
