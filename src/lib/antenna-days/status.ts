/**
 * The life of an antenna day: draft → published → done, or cancelled from draft or published.
 * Done and cancelled are final. Pure: the rules take the day's times and `now`.
 */

export const DAY_STATUSES = ["draft", "published", "done", "cancelled"] as const;
export type DayStatus = (typeof DAY_STATUSES)[number];

export const dayStatusLabels: Record<DayStatus, string> = {
  draft: "Draft",
  published: "Published",
  done: "Done",
  cancelled: "Cancelled",
};

const allowedNext: Record<DayStatus, readonly DayStatus[]> = {
  draft: ["published", "cancelled"],
  published: ["done", "cancelled"],
  done: [],
  cancelled: [],
};

export interface DayTimes {
  startsAt: Date;
  endsAt: Date;
}

/** Why the day cannot move from `from` to `to` now, or null when it can. */
export function transitionProblem(from: DayStatus, to: DayStatus, day: DayTimes, now: Date): string | null {
  if (from === to) return `The day is already ${dayStatusLabels[to].toLowerCase()}.`;
  if (!allowedNext[from].includes(to)) {
    if (from === "done" || from === "cancelled") return `A ${dayStatusLabels[from].toLowerCase()} day cannot change any more; copy it to plan a new one.`;
    return `A ${dayStatusLabels[from].toLowerCase()} day cannot become ${dayStatusLabels[to].toLowerCase()}.`;
  }
  if (to === "published" && day.endsAt <= now) return "This day has already ended: change its dates before publishing it.";
  if (to === "done" && day.endsAt > now) return "A day can be marked done only after it has ended.";
  return null;
}

/** The moves a coordinator may offer for a day now. */
export function availableTransitions(from: DayStatus, day: DayTimes, now: Date): DayStatus[] {
  return allowedNext[from].filter((to) => transitionProblem(from, to, day, now) === null);
}

/** Details, slots and shifts can change only while the day is a draft or published. */
export const isEditable = (status: DayStatus): boolean => status === "draft" || status === "published";

/** Only drafts are deleted; a published day is cancelled instead, so members are told. */
export const isDeletable = (status: DayStatus): boolean => status === "draft";
