// Times typed into Guyline: a wall-clock time ("2026-06-13T09:00") is read in the club's time
// zone; a time with an offset or Z ("2026-06-13T08:00Z") is already an instant.
import { wallTimeToInstant } from "@/lib/time";

export const timeInputPattern = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,3})?)?(Z|[+-]\d{2}:\d{2})?$/;

export function timeInputToInstant(value: string, timeZone: string): Date {
  return /(Z|[+-]\d{2}:\d{2})$/.test(value) ? new Date(value) : wallTimeToInstant(value, timeZone);
}
