// Every role against every permission the policy names. The expected table is written out
// from product.md's role table by hand, so a change to the policy must change it here too.
// Source: Guyline product brief (shared/design/product.md), "Roles".
import { describe, expect, it } from "vitest";
import { roles, type Role } from "@/lib/roles";
import { can, canCoSignLoan, canDeleteSweep, canEditLibraryPlan, canReturnLoan, canSeeBooking, canUploadSweep, loanNeedsCoSign, permissions, type Actor, type Permission } from "@/server/policy";

const C = "coordinator", S = "steward", M = "member", N = "newcomer";

const expected: Record<Permission, Role[]> = {
  "account.edit": [C, S, M, N],
  "members.manage": [C],
  "club.configure": [C],
  "antennaDays.view": [C, S, M, N],
  "antennaDays.viewDrafts": [C],
  "antennaDays.manage": [C],
  "shifts.signUp": [C, S, M],
  "plans.view": [C, S, M, N],
  "plans.save": [C, S, M],
  "engine.use": [C, S, M, N],
  "gear.view": [C, S, M, N],
  "gear.manage": [C, S],
  "loans.request": [C, S, M, N],
  "loans.manage": [C, S],
  "loans.viewAll": [C, S],
  "buildSessions.view": [C, S, M, N],
  "buildSessions.signUp": [C, S, M, N],
  "buildSessions.manage": [C],
  "sweeps.upload": [C, S, M],
  "devInbox.view": [C],
};

const actor = (role: Role, extra: Partial<Actor> = {}): Actor => ({ id: `id-${role}`, role, isMentor: false, confirmed: true, ...extra });

describe("policy: every role against every permission", () => {
  it("names every permission in the expected table", () => {
    expect(new Set(permissions)).toEqual(new Set(Object.keys(expected)));
  });

  for (const permission of permissions) {
    for (const role of roles) {
      const allowed = expected[permission].includes(role);
      it(`${role} ${allowed ? "may" : "may not"} ${permission}`, () => {
        expect(can(actor(role), permission)).toBe(allowed);
      });
    }
  }

  it("gives signed-out visitors nothing", () => {
    for (const permission of permissions) expect(can(null, permission)).toBe(false);
  });

  it("lets an unconfirmed account edit only its own settings", () => {
    for (const role of roles) {
      const unconfirmed = actor(role, { confirmed: false });
      for (const permission of permissions) expect(can(unconfirmed, permission)).toBe(permission === "account.edit");
    }
  });
});

describe("policy: rules about a resource", () => {
  it("needs a mentor's co-sign only for a newcomer borrowing an analyser", () => {
    expect(loanNeedsCoSign({ role: N }, "analyser")).toBe(true);
    expect(loanNeedsCoSign({ role: N }, "coax")).toBe(false);
    expect(loanNeedsCoSign({ role: M }, "analyser")).toBe(false);
  });

  it("lets only a confirmed mentor, not the borrower, co-sign", () => {
    expect(canCoSignLoan(actor(M, { isMentor: true }), "someone-else")).toBe(true);
    expect(canCoSignLoan(actor(M, { isMentor: true }), "id-member")).toBe(false);
    expect(canCoSignLoan(actor(M), "someone-else")).toBe(false);
    expect(canCoSignLoan(actor(M, { isMentor: true, confirmed: false }), "someone-else")).toBe(false);
    expect(canCoSignLoan(null, "someone-else")).toBe(false);
  });

  it("lets members upload sweeps only for days they take part in; coordinators always", () => {
    expect(canUploadSweep(actor(C), false)).toBe(true);
    expect(canUploadSweep(actor(M), true)).toBe(true);
    expect(canUploadSweep(actor(M), false)).toBe(false);
    expect(canUploadSweep(actor(N), true)).toBe(false);
  });

  it("lets a borrower return their own loan and keepers take back anyone's", () => {
    expect(canReturnLoan(actor(M), "id-member")).toBe(true);
    expect(canReturnLoan(actor(M), "someone-else")).toBe(false);
    expect(canReturnLoan(actor(N), "id-newcomer")).toBe(true);
    expect(canReturnLoan(actor(S), "someone-else")).toBe(true);
    expect(canReturnLoan(actor(C), "someone-else")).toBe(true);
    expect(canReturnLoan(actor(M, { confirmed: false }), "id-member")).toBe(false);
    expect(canReturnLoan(null, "id-member")).toBe(false);
  });

  it("shows a booking to its borrower, keepers, and mentors only while it waits for a co-sign", () => {
    expect(canSeeBooking(actor(M), { borrowerId: "id-member", awaitingCoSign: false })).toBe(true);
    expect(canSeeBooking(actor(M), { borrowerId: "someone-else", awaitingCoSign: false })).toBe(false);
    expect(canSeeBooking(actor(S), { borrowerId: "someone-else", awaitingCoSign: false })).toBe(true);
    expect(canSeeBooking(actor(M, { isMentor: true }), { borrowerId: "someone-else", awaitingCoSign: true })).toBe(true);
    expect(canSeeBooking(actor(M, { isMentor: true }), { borrowerId: "someone-else", awaitingCoSign: false })).toBe(false);
    expect(canSeeBooking(actor(N), { borrowerId: "someone-else", awaitingCoSign: true })).toBe(false);
  });
});

describe("policy: the plan library", () => {
  it("lets the person who saved a plan, or a coordinator, change or delete it", () => {
    expect(canEditLibraryPlan(actor(M), "id-member")).toBe(true);
    expect(canEditLibraryPlan(actor(M), "someone-else")).toBe(false);
    expect(canEditLibraryPlan(actor(S), "someone-else")).toBe(false);
    expect(canEditLibraryPlan(actor(C), "someone-else")).toBe(true);
    expect(canEditLibraryPlan(actor(C), null)).toBe(true);
    expect(canEditLibraryPlan(actor(N), "id-newcomer")).toBe(false);
    expect(canEditLibraryPlan(actor(M, { confirmed: false }), "id-member")).toBe(false);
    expect(canEditLibraryPlan(null, "id-member")).toBe(false);
  });
});

describe("policy: measured sweeps", () => {
  it("lets the person who uploaded a sweep, or a coordinator, delete it", () => {
    expect(canDeleteSweep(actor(M), "id-member")).toBe(true);
    expect(canDeleteSweep(actor(M), "someone-else")).toBe(false);
    expect(canDeleteSweep(actor(S), "someone-else")).toBe(false);
    expect(canDeleteSweep(actor(C), "someone-else")).toBe(true);
    expect(canDeleteSweep(actor(C), null)).toBe(true);
    expect(canDeleteSweep(actor(N), "id-newcomer")).toBe(false);
    expect(canDeleteSweep(actor(M, { confirmed: false }), "id-member")).toBe(false);
    expect(canDeleteSweep(null, "id-member")).toBe(false);
  });
});
