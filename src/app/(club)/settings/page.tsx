import type { Metadata } from "next";
import { Card, PageHeader } from "@/components/ui/notice";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { requirePageViewer } from "@/server/session";
import { ClubSettingsForm, PasswordForm, ProfileForm } from "./settings-forms";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const { actor, member } = await requirePageViewer("account.edit");
  const club = can(actor, "club.configure") ? await getClubSettings() : null;
  return (
    <>
      <PageHeader title="Settings" />
      <div className="grid gap-6 lg:grid-cols-2">
        <div>
          <Card title="Your details">
            <p className="mb-4 text-sm text-slate-600">Signed in as {member.email}.</p>
            <ProfileForm defaults={{ name: member.name, callSign: member.callSign ?? "", units: member.units }} />
          </Card>
          <Card title="Password">
            <PasswordForm />
          </Card>
        </div>
        {club && (
          <Card title="The club">
            <ClubSettingsForm
              defaults={{ clubName: club.clubName, ituRegion: club.ituRegion, timeZone: club.timeZone, defaultUnits: club.defaultUnits, joinCode: club.joinCode }}
              timeZones={Intl.supportedValuesOf("timeZone")}
            />
          </Card>
        )}
      </div>
    </>
  );
}
