import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CutSheetTable } from "@/components/antenna-plan/cut-sheet-table";
import { CancelSessionForm, PlaceControls } from "@/components/build-sessions/place-controls";
import { PlacesBadge } from "@/components/build-sessions/places";
import { ButtonLink, buttonClass } from "@/components/ui/button";
import { Card, Notice, PageHeader } from "@/components/ui/notice";
import { localCodesPrevail } from "@/lib/build-sessions/safety";
import { formatDistance } from "@/lib/plan-screen/format";
import { formatRangeInZone } from "@/lib/time";
import { PublicError } from "@/server/errors";
import { can } from "@/server/policy";
import { getBuildSession } from "@/server/services/build-sessions";
import { requirePageViewer } from "@/server/session";
import { cancelBuildSessionAction, cancelSignupAction, signUpAction } from "../actions";

export const metadata: Metadata = { title: "Build session" };

export default async function BuildSessionPage({ params }: { params: Promise<{ id: string }> }) {
  const { actor, member } = await requirePageViewer("buildSessions.view");
  const units = member.units;
  const { id } = await params;
  const session = await getBuildSession(actor, id).catch((error: unknown) => {
    if (error instanceof PublicError && error.status === 404) notFound();
    throw error;
  });
  const manages = can(actor, "buildSessions.manage");
  const cancelled = session.status === "cancelled";
  const started = new Date(session.startsAt) <= new Date();
  const { planResult, materials } = session;

  return (
    <>
      <PageHeader title={session.title}>
        {/* A plain link: the file is a download, not a page. */}
        <a className={buttonClass("secondary")} href={`/api/build-sessions/${session.id}/ics`} download>
          Add to my calendar (.ics)
        </a>
        {manages && !cancelled && (
          <ButtonLink variant="secondary" href={`/build-sessions/${session.id}/edit`}>
            Change
          </ButtonLink>
        )}
      </PageHeader>
      {cancelled && <Notice tone="danger" title="This build session is cancelled." />}

      <div className="grid gap-6 lg:grid-cols-2">
        <Card title="When and where">
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="font-bold text-slate-600">When</dt>
            <dd>
              {formatRangeInZone(session.startsAt, session.endsAt, session.timeZone)} <span className="text-sm text-slate-600">({session.timeZone})</span>
            </dd>
            <dt className="font-bold text-slate-600">Where</dt>
            <dd>{session.place}</dd>
            <dt className="font-bold text-slate-600">Mentors</dt>
            <dd>{session.mentors.map((mentor) => mentor.name).join(", ")}</dd>
            <dt className="font-bold text-slate-600">Antenna</dt>
            <dd>
              {planResult.label}
              {session.libraryPlan && (
                <>
                  {" "}
                  <span className="text-sm">
                    (from the plan library: <Link href={`/bench/library/${session.libraryPlan.id}`}>{session.libraryPlan.name}</Link>)
                  </span>
                </>
              )}
            </dd>
          </dl>
          {session.notes && <p className="mt-3 whitespace-pre-line">{session.notes}</p>}
          <div className="mt-3">
            <PlacesBadge session={session} />
          </div>
        </Card>
        <Card title="Your place">
          {cancelled || started ? (
            <p className="text-slate-700">{cancelled ? "Sign-ups are closed: the session is cancelled." : "Sign-ups are closed: the session has started."}</p>
          ) : (
            <PlaceControls
              sessionId={session.id}
              myPlace={session.myPlace}
              full={session.taken >= session.capacity}
              open={!session.mentors.some((mentor) => mentor.id === actor.id)}
              signUp={signUpAction}
              cancel={cancelSignupAction}
            />
          )}
          <p className="mt-3 text-sm text-slate-600">When a place frees up, the first on the waitlist gets it at once and is told by e-mail.</p>
        </Card>
      </div>

      {session.participants && (
        <Card title={`Who is coming (${session.taken} of ${session.capacity})`}>
          {session.participants.length === 0 ? (
            <p className="text-slate-600">Nobody has signed up yet.</p>
          ) : (
            <ol className="list-decimal pl-6">
              {session.participants.map((person) => (
                <li key={person.id}>
                  {person.name}
                  {person.callSign ? ` (${person.callSign})` : ""}
                  {person.status === "waitlisted" && <span className="text-slate-600"> · waitlist, number {person.position}</span>}
                </li>
              ))}
            </ol>
          )}
        </Card>
      )}

      <Card title="Cut sheet">
        <div className="overflow-x-auto">
          <CutSheetTable cutSheet={planResult.cutSheet} units={units} caption={`${planResult.label}: cut each piece to the bold length`} />
        </div>
        <p className="mt-2 text-sm text-slate-600">{planResult.cutSheet.wrapNote}</p>
        <p className="mt-1 text-sm text-slate-600">
          Feed with a {planResult.transformer.label} and {planResult.feedline.label} coax ({formatDistance(planResult.feedline.lengthM, units)}). The lengths are the antenna
          engine&apos;s, tuned for resonance at the plan&apos;s height and ground; trim on the day with an analyser.
        </p>
      </Card>

      <Card title={`Materials (${materials.participants} places)`}>
        <div className="overflow-x-auto">
          <table className="w-full text-left">
            <thead>
              <tr className="text-sm text-slate-600">
                <th className="py-2 pr-3">Item</th>
                <th className="py-2 pr-3">Per participant</th>
                <th className="py-2 pr-3">For the session</th>
                <th className="py-2">Note</th>
              </tr>
            </thead>
            <tbody>
              {materials.lines.map((line) => (
                <tr key={line.item} className="border-t border-slate-200">
                  <td className="py-2 pr-3">{line.item}</td>
                  <td className="py-2 pr-3">{line.unit === "m" ? `${line.perParticipant} m` : line.perParticipant}</td>
                  <td className="py-2 pr-3 font-bold">{line.unit === "m" ? `${line.total} m` : line.total}</td>
                  <td className="py-2 text-sm text-slate-600">{line.note}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <ul className="mt-3 list-disc pl-6 text-sm text-slate-600">
          {materials.allowances.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      </Card>

      <Card title="Bring or borrow">
        <ul className="divide-y divide-slate-200">
          {materials.kit.map((entry) => (
            <li key={entry.item} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span>
                {entry.item}
                {entry.note && <span className="block text-sm text-slate-600">{entry.note}</span>}
              </span>
              {entry.source === "borrow" ? <Link href="/lending">Request it from the lending desk</Link> : <span className="text-sm font-bold text-slate-700">Bring your own</span>}
            </li>
          ))}
        </ul>
      </Card>

      <Card title="Safety">
        {session.safety.map((section) => (
          <Notice key={section.title} tone="caution" title={section.title}>
            <ul className="list-disc pl-6">
              {section.items.map((item) => (
                <li key={item}>{item}</li>
              ))}
            </ul>
          </Notice>
        ))}
        {planResult.cautions.length > 0 && (
          <Notice tone="caution" title="From the antenna plan">
            <ul className="list-disc pl-6">
              {planResult.cautions.map((item) => (
                <li key={item}>{item}</li>
              ))}
            </ul>
          </Notice>
        )}
        <p className="font-bold">{localCodesPrevail}</p>
      </Card>

      {manages && !cancelled && (
        <Card title="Cancel the session">
          <CancelSessionForm sessionId={session.id} cancelSession={cancelBuildSessionAction} />
        </Card>
      )}
    </>
  );
}
