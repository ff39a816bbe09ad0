import Link from "next/link";
import { Card, EmptyState, PageHeader } from "@/components/ui/notice";
import { whatNeedsMeNext } from "@/server/services/home";
import { requirePageViewer } from "@/server/session";

export default async function HomePage() {
  const { actor, member } = await requirePageViewer();
  const sections = await whatNeedsMeNext(actor);
  return (
    <>
      <PageHeader title={`Hello, ${member.name.split(" ")[0]}`} />
      <h2 className="mb-3">What needs you next</h2>
      {sections.length === 0 && <EmptyState title="Nothing waits for you right now." />}
      {sections.map((section) => (
        <Card key={section.heading} title={section.heading}>
          {section.things.length === 0 ? (
            <p className="text-slate-600">{section.emptyText}</p>
          ) : (
            <ul className="divide-y divide-slate-200">
              {section.things.map((thing) => (
                <li key={thing.href + thing.title} className="py-2">
                  <Link href={thing.href} className="font-bold">
                    {thing.title}
                  </Link>
                  {thing.detail && <p className="text-sm text-slate-600">{thing.detail}</p>}
                </li>
              ))}
            </ul>
          )}
        </Card>
      ))}
    </>
  );
}
