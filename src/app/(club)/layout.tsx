import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { Notice } from "@/components/ui/notice";
import { roleLabels } from "@/lib/roles";
import { navigationFor } from "@/server/navigation";
import { getClubSettings } from "@/server/services/accounts";
import { requirePageViewer } from "@/server/session";

export default async function ClubLayout({ children }: { children: ReactNode }) {
  const { actor, member } = await requirePageViewer();
  const settings = await getClubSettings();
  return (
    <AppShell clubName={settings.clubName} userName={member.name} roleLabel={roleLabels[member.role]} navigation={navigationFor(actor)}>
      {!actor.confirmed && (
        <Notice tone="info" title="Welcome! A coordinator still has to confirm your account.">
          Until then you can change your own settings. You will see the club&apos;s antenna days, gear and build sessions once you are confirmed.
        </Notice>
      )}
      {children}
    </AppShell>
  );
}
