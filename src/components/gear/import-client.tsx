"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { importItemsAction } from "@/app/(club)/gear/actions";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { gearKindLabels, type GearKind } from "@/lib/gear/kinds";
import type { ImportOutcome } from "@/server/services/gear";

export function ImportClient() {
  const router = useRouter();
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState("");
  const [outcome, setOutcome] = useState<ImportOutcome | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();

  const send = (mode: "preview" | "commit", text: string) =>
    startTransition(async () => {
      const result = await importItemsAction({ mode, csv: text });
      setError(result.data ? null : (result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? "That did not work."));
      setOutcome((result.data as ImportOutcome | undefined) ?? null);
      if (mode === "commit" && result.ok) router.refresh();
    });

  return (
    <div>
      <label className="block font-bold">
        CSV file
        <input
          type="file"
          accept=".csv,text/csv"
          className="mt-1 block"
          onChange={async (event) => {
            const file = event.target.files?.[0];
            if (!file) return;
            const text = await file.text();
            setCsv(text);
            setFileName(file.name);
            send("preview", text);
          }}
        />
      </label>
      {error && <Notice tone="danger">{error}</Notice>}
      {outcome && outcome.mode === "commit" && outcome.imported > 0 && (
        <Notice tone="success" title={`${outcome.imported} items were imported.`}>
          They are on the shelf now.
        </Notice>
      )}
      {outcome && outcome.problems.length > 0 && (
        <Notice tone="danger" title={`${fileName}: ${outcome.problems.length} problem${outcome.problems.length === 1 ? "" : "s"}. Nothing is imported until every row is right.`}>
          <ul className="mt-2 list-disc pl-5" aria-label="Problems in the file">
            {outcome.problems.map((problem, index) => (
              <li key={index}>
                Line {problem.line}
                {problem.field && <>, column {problem.field}</>}: {problem.message}
              </li>
            ))}
          </ul>
        </Notice>
      )}
      {outcome && outcome.rows.length > 0 && !(outcome.mode === "commit" && outcome.imported > 0) && (
        <div className="mt-4">
          <h2 className="mb-2">Rows that are right ({outcome.rows.length})</h2>
          <table className="w-full text-left text-sm">
            <thead>
              <tr className="border-b border-slate-300">
                <th className="py-1 pr-3">Line</th>
                <th className="py-1 pr-3">Label</th>
                <th className="py-1 pr-3">Name</th>
                <th className="py-1">Kind</th>
              </tr>
            </thead>
            <tbody>
              {outcome.rows.map((row) => (
                <tr key={row.line} className="border-b border-slate-200">
                  <td className="py-1 pr-3">{row.line}</td>
                  <td className="py-1 pr-3 font-bold">{row.labelCode}</td>
                  <td className="py-1 pr-3">{row.name}</td>
                  <td className="py-1">{gearKindLabels[row.kind as GearKind]}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {outcome.problems.length === 0 && csv && (
            <Button className="mt-4" disabled={pending} onClick={() => send("commit", csv)}>
              Import {outcome.rows.length} items
            </Button>
          )}
        </div>
      )}
    </div>
  );
}
