/** Guyline's roles, from the most to the least trusted. `mentor` is a flag on a member, not a role. */
export const roles = ["coordinator", "steward", "member", "newcomer"] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  coordinator: "Coordinator",
  steward: "Gear steward",
  member: "Member",
  newcomer: "Newcomer",
};
