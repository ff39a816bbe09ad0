import type { Metadata } from "next";
import Link from "next/link";
import { Card, PageHeader } from "@/components/ui/notice";
import { feedStatus } from "@/server/calendar/feeds";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { devInboxOpen } from "@/server/services/dev-inbox";
import { getMailChoices } from "@/server/services/mail-preferences";
import { requirePageViewer } from "@/server/session";
import { CalendarFeedControls, MailChoicesForm } from "./mail-settings";
import { ClubSettingsForm, PasswordForm, ProfileForm } from "./settings-forms";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const { actor, member } = await requirePageViewer("account.edit");
  const [settings, mailChoices, feed] = await Promise.all([getClubSettings(), getMailChoices(actor), feedStatus(actor)]);
  const club = can(actor, "club.configure") ? settings : null;
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
          <Card title="E-mail">
            <MailChoicesForm defaults={mailChoices} />
          </Card>
        </div>
        <div>
          <Card title="Calendar feed">
            <p className="mb-3 text-slate-700">One private address for your calendar app with the build sessions you take part in or mentor, kept up to date as they change.</p>
            {actor.confirmed ? <CalendarFeedControls active={feed.active} since={feed.createdAt} timeZone={settings.timeZone} /> : <p>Your account must be confirmed first.</p>}
          </Card>
          {devInboxOpen(actor) && (
            <Card title="Development inbox">
              <p>
                This deployment catches its e-mail locally. <Link href="/dev/inbox">Open the development inbox</Link>.
              </p>
            </Card>
          )}
          {club && (
            <Card title="The club">
              <ClubSettingsForm
                defaults={{ clubName: club.clubName, ituRegion: club.ituRegion, timeZone: club.timeZone, defaultUnits: club.defaultUnits, joinCode: club.joinCode }}
                timeZones={Intl.supportedValuesOf("timeZone")}
              />
            </Card>
          )}
        </div>
      </div>
    </>
  );
}
