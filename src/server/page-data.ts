// For pages: a resource that is missing (or not for this person's eyes), or an id in the URL
// that is not an id at all, renders the 404 page instead of an error.
import { notFound } from "next/navigation";
import { z } from "zod";
import { PublicError } from "@/server/errors";

export async function loadOrNotFound<T>(id: string, load: (id: string) => Promise<T>): Promise<T> {
  if (!z.uuid().safeParse(id).success) notFound();
  try {
    return await load(id);
  } catch (error) {
    if (error instanceof PublicError && error.status === 404) notFound();
    throw error;
  }
}
