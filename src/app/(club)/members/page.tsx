import type { Metadata } from "next";
import { Card, PageHeader } from "@/components/ui/notice";
import { roleLabels } from "@/lib/roles";
import { formatInZone } from "@/lib/time";
import { getClubSettings, listMembers, listPendingInvitations } from "@/server/services/accounts";
import { requirePageViewer } from "@/server/session";
import { InviteForm, MemberRow } from "./members-client";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage() {
  const { actor } = await requirePageViewer("members.manage");
  const [members, invitations, { timeZone }] = await Promise.all([listMembers(actor), listPendingInvitations(actor), getClubSettings()]);
  const waiting = members.filter((member) => !member.confirmed);
  return (
    <>
      <PageHeader title="Members" />
      {waiting.length > 0 && (
        <p className="mb-4 font-bold text-copper-800">
          {waiting.length} {waiting.length === 1 ? "person waits" : "people wait"} for confirmation.
        </p>
      )}
      <Card title={`The club (${members.length})`}>
        <div className="overflow-x-auto">
          <table className="w-full text-left">
            <thead>
              <tr className="text-sm text-slate-600">
                <th className="py-2 pr-3">Name</th>
                <th className="py-2 pr-3">Role</th>
                <th className="py-2 pr-3">Mentor</th>
                <th className="py-2">Account</th>
              </tr>
            </thead>
            <tbody>
              {members.map((member) => (
                <MemberRow key={member.id} member={member} isSelf={member.id === actor.id} />
              ))}
            </tbody>
          </table>
        </div>
      </Card>
      <Card title="Invite someone">
        <InviteForm />
        {invitations.length > 0 && (
          <>
            <h3 className="mt-6 font-bold">Open invitations</h3>
            <ul className="mt-2 text-sm">
              {invitations.map((invitation) => (
                <li key={invitation.id}>
                  {invitation.name} ({invitation.email}), {roleLabels[invitation.role]}, until {formatInZone(invitation.expiresAt, timeZone, "date")}
                </li>
              ))}
            </ul>
          </>
        )}
      </Card>
    </>
  );
}
