// The only place that decides who may do what. Every server action, route handler and page
// asks here; the UI may hide a control with the same function, but hiding is never the guard.
// Pure functions of plain data, so that every rule is unit-tested.
import type { Role } from "@/lib/roles";

export interface Actor {
  id: string;
  role: Role;
  isMentor: boolean;
  /** False until a coordinator confirms someone who joined with the join code. */
  confirmed: boolean;
}

const everyone: readonly Role[] = ["coordinator", "steward", "member", "newcomer"];
const membersAndUp: readonly Role[] = ["coordinator", "steward", "member"];
const gearKeepers: readonly Role[] = ["coordinator", "steward"];
const coordinators: readonly Role[] = ["coordinator"];

/** Each permission and the roles that hold it (product.md, "Roles"). */
export const permissionRoles = {
  // the signed-in person's own account; open to unconfirmed accounts too
  "account.edit": everyone,
  // the club and its people
  "members.manage": coordinators,
  "club.configure": coordinators,
  // antenna days, sites, station slots, shifts
  "antennaDays.view": everyone,
  "antennaDays.viewDrafts": coordinators,
  "antennaDays.manage": coordinators,
  "shifts.signUp": membersAndUp,
  // antenna plans and the antenna bench
  "plans.view": everyone,
  "plans.save": membersAndUp,
  "engine.use": everyone,
  // gear shelf and lending desk
  "gear.view": everyone,
  "gear.manage": gearKeepers,
  "loans.request": everyone,
  "loans.manage": gearKeepers,
  "loans.viewAll": gearKeepers,
  // build sessions
  "buildSessions.view": everyone,
  "buildSessions.signUp": everyone,
  "buildSessions.manage": coordinators,
  // measured sweeps (members only for slots of days they take part in: canUploadSweep)
  "sweeps.upload": membersAndUp,
  // the captured-mail page of development and demo deployments
  "devInbox.view": coordinators,
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissionRoles;
export const permissions = Object.keys(permissionRoles) as Permission[];

/** Permissions an account awaiting confirmation already holds. */
const openToUnconfirmed: ReadonlySet<Permission> = new Set(["account.edit"]);

export function can(actor: Actor | null, permission: Permission): boolean {
  if (!actor) return false;
  if (!actor.confirmed && !openToUnconfirmed.has(permission)) return false;
  return (permissionRoles[permission] as readonly Role[]).includes(actor.role);
}

/** Co-signing a newcomer's analyser loan takes a confirmed mentor who is not the borrower. */
export function canCoSignLoan(actor: Actor | null, borrowerId: string): boolean {
  return !!actor && actor.confirmed && actor.isMentor && actor.role !== "newcomer" && actor.id !== borrowerId;
}

/** Newcomers borrow an antenna analyser only with a mentor's co-sign. */
export function loanNeedsCoSign(borrower: Pick<Actor, "role">, itemKind: string): boolean {
  return borrower.role === "newcomer" && itemKind === "analyser";
}

/**
 * Coordinators may upload to any slot; members only to slots of days they take part in
 * (signed up for a shift of the day, its safety lead, or holding gear booked for it: the
 * sweeps service decides, see takesPartInDay).
 */
export function canUploadSweep(actor: Actor | null, takesPartInDay: boolean): boolean {
  if (!can(actor, "sweeps.upload")) return false;
  return actor!.role === "coordinator" || takesPartInDay;
}

/** A sweep is deleted by the person who uploaded it, or a coordinator. */
export function canDeleteSweep(actor: Actor | null, uploadedBy: string | null): boolean {
  if (!can(actor, "sweeps.upload")) return false;
  return actor!.role === "coordinator" || actor!.id === uploadedBy;
}

/** A person may cancel their own booking, loan request or sign-up; keepers may cancel anyone's. */
export function canCancelFor(actor: Actor | null, ownerId: string, managerPermission: Permission): boolean {
  if (!actor || !actor.confirmed) return false;
  return actor.id === ownerId || can(actor, managerPermission);
}

/** Build sessions need mentors: only members flagged as mentors can be assigned. */
export function canMentorSessions(person: Pick<Actor, "isMentor" | "role" | "confirmed">): boolean {
  return person.isMentor && person.confirmed && person.role !== "newcomer";
}

/** A plan in the plan library is changed or deleted by the person who saved it, or a coordinator. */
export function canEditLibraryPlan(actor: Actor | null, createdBy: string | null): boolean {
  if (!can(actor, "plans.save")) return false;
  return actor!.role === "coordinator" || actor!.id === createdBy;
}

/** A borrower records the return of their own loan; keepers take back anyone's. */
export function canReturnLoan(actor: Actor | null, borrowerId: string): boolean {
  if (!can(actor, "loans.request")) return false;
  return actor!.id === borrowerId || can(actor, "loans.manage");
}

/** A booking is seen by its borrower, by keepers, and by mentors while it waits for their co-sign. */
export function canSeeBooking(actor: Actor | null, booking: { borrowerId: string; awaitingCoSign: boolean }): boolean {
  if (!can(actor, "loans.request")) return false;
  if (actor!.id === booking.borrowerId || can(actor, "loans.viewAll")) return true;
  return booking.awaitingCoSign && canCoSignLoan(actor, booking.borrowerId);
}
