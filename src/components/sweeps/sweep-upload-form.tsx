"use client";

// Uploading a measured sweep: the file is read in the browser as soon as it is chosen (the
// same reader the server uses), the detected columns are shown over a preview of the rows and
// can be corrected, and every change re-reads the points, so problems show with their lines
// before anything is sent. The upload goes to the route as multipart/form-data.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useMemo, useState, type ChangeEvent } from "react";
import { useFieldArray, useForm, useWatch, type Path, type Resolver } from "react-hook-form";
import type { z } from "zod";
import { tableClass } from "@/components/antenna-plan/table-class";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SWEEP_PLACES, type SweepPlace } from "@/lib/sweeps/feed-point";
import {
  FREQUENCY_UNITS,
  QUANTITY_LABELS,
  SWEEP_LIMITS,
  SWEEP_QUANTITIES,
  decodeSweepFile,
  detectMapping,
  problemText,
  readPoints,
  readSweepTable,
  type FrequencyUnit,
  type SweepMapping,
  type SweepQuantity,
  type SweepTable,
} from "@/lib/sweeps/parse";
import { sweepMappingSchema, sweepUploadFormSchema } from "@/validations/sweeps";
import { sweepHref } from "./sweep-href";

export interface AnalyserOption {
  id: string;
  labelCode: string;
  name: string;
  minMhz: number;
  maxMhz: number;
}

interface FormValues {
  mapping: { frequencyColumn: string; frequencyUnit: FrequencyUnit; quantity: SweepQuantity; swrColumn: string; rColumn: string; xColumn: string; returnLossColumn: string };
  place: SweepPlace;
  analyserId: string;
  measuredAt: string;
  builtLengths: { value: string }[];
  note: string;
}
type FormOutput = z.output<typeof sweepUploadFormSchema>;

const PREVIEW_ROWS = 8;
const column = (index: number | null) => (index === null ? "" : String(index));
const formMapping = (mapping: SweepMapping): FormValues["mapping"] => ({
  frequencyColumn: column(mapping.frequencyColumn),
  frequencyUnit: mapping.frequencyUnit,
  quantity: mapping.quantity,
  swrColumn: column(mapping.swrColumn),
  rColumn: column(mapping.rColumn),
  xColumn: column(mapping.xColumn),
  returnLossColumn: column(mapping.returnLossColumn),
});

export interface SweepUploadFormProps {
  /** The route that takes the upload: /api/slots/:id/sweeps or /api/plans/:id/sweeps. */
  uploadUrl: string;
  /** The page to show the new sweep on (with sweep=<id> added to its query). */
  pagePath: string;
  analysers: AnalyserOption[];
  /** One label per element of the plan (its band), for the lengths as built. */
  elements: string[];
  /** What lies between the feed point and the radio, said for the radio-end choice. */
  feedline: string;
  /** Now, as a wall-clock time in the club's zone: the default for when it was measured. */
  nowLocal: string;
}

export function SweepUploadForm({ uploadUrl, pagePath, analysers, elements, feedline, nowLocal }: SweepUploadFormProps) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [table, setTable] = useState<SweepTable | null>(null);
  const [notes, setNotes] = useState<string[]>([]);
  const [fileProblems, setFileProblems] = useState<string[]>([]);
  const [formMessage, setFormMessage] = useState<string | null>(null);
  const form = useForm<FormValues, unknown, FormOutput>({
    resolver: zodResolver(sweepUploadFormSchema as never) as unknown as Resolver<FormValues, unknown, FormOutput>,
    defaultValues: {
      mapping: { frequencyColumn: "0", frequencyUnit: "MHz", quantity: "swr", swrColumn: "1", rColumn: "", xColumn: "", returnLossColumn: "" },
      place: "radio-end",
      analyserId: "",
      measuredAt: nowLocal,
      builtLengths: elements.map(() => ({ value: "" })),
      note: "",
    },
    mode: "onSubmit",
    reValidateMode: "onChange",
  });
  const lengths = useFieldArray({ control: form.control, name: "builtLengths" });
  const mappingValues = useWatch({ control: form.control, name: "mapping" });
  const quantity = mappingValues.quantity;
  const errorOf = (field: string) =>
    (field.split(".").reduce<unknown>((node, key) => (node as Record<string, unknown> | undefined)?.[key], form.formState.errors) as { message?: string } | undefined)?.message;

  // The points as the current mapping reads them: the preview's verdict, before sending.
  const reading = useMemo(() => {
    if (!table) return null;
    const mapping = sweepMappingSchema.safeParse(mappingValues);
    if (!mapping.success) return { points: null, problems: mapping.error.issues.map((issue) => issue.message) };
    const points = readPoints(table, mapping.data);
    return points.ok ? { points: points.value, problems: [] } : { points: null, problems: points.problems.map(problemText) };
  }, [table, mappingValues]);

  const chooseFile = async (event: ChangeEvent<HTMLInputElement>) => {
    const chosen = event.target.files?.[0] ?? null;
    setFile(chosen);
    setTable(null);
    setNotes([]);
    setFileProblems([]);
    setFormMessage(null);
    if (!chosen) return;
    if (chosen.size > SWEEP_LIMITS.maxBytes) {
      setFileProblems([`The file is ${(chosen.size / 1024 / 1024).toFixed(1)} MB; a sweep file may be at most 1 MB.`]);
      return;
    }
    const text = decodeSweepFile(new Uint8Array(await chosen.arrayBuffer()));
    const read = text.ok ? readSweepTable(text.value) : text;
    if (!read.ok) {
      setFileProblems(read.problems.map(problemText));
      return;
    }
    const detected = detectMapping(read.value);
    setTable(read.value);
    setNotes(detected.notes);
    form.setValue("mapping", formMapping(detected.mapping));
  };

  const onSubmit = form.handleSubmit(async (values) => {
    setFormMessage(null);
    if (!file || !reading?.points) {
      setFileProblems((current) => (current.length > 0 ? current : ["Choose a sweep file that reads without problems."]));
      return;
    }
    const data = new FormData();
    data.set("file", file);
    data.set("mapping", JSON.stringify(values.mapping));
    data.set("place", values.place);
    data.set("analyserId", values.analyserId);
    data.set("measuredAt", values.measuredAt);
    const built = values.builtLengths.map(({ value }) => (value === "" ? null : Number(value.replace(",", "."))));
    if (built.some((length) => length !== null)) data.set("builtLengthsM", JSON.stringify(built));
    data.set("note", values.note);
    const response = await fetch(uploadUrl, { method: "POST", body: data });
    const body = await response.json();
    if (response.ok) {
      router.push(sweepHref(pagePath, body.sweep.id));
      router.refresh();
      return;
    }
    const unplaced: string[] = [];
    for (const problem of (body.problems ?? []) as { path: string; message: string }[]) {
      if (problem.path === "file") setFileProblems((current) => [...current, problem.message]);
      else if (/^(mapping\.\w+|place|analyserId|measuredAt|note)$/.test(problem.path)) form.setError(problem.path as Path<FormValues>, { type: "server", message: problem.message });
      else unplaced.push(problem.message);
    }
    if (unplaced.length > 0 || !body.problems) setFormMessage(unplaced.join(" ") || body.message || "The upload did not work.");
  });

  const columnOptions = [{ value: "", label: "—" }, ...(table?.columns ?? []).map((c) => ({ value: String(c.index), label: `Column ${c.index + 1}${c.name ? ` (${c.name})` : ""}` }))];
  const columnField = (name: "frequencyColumn" | "swrColumn" | "rColumn" | "xColumn" | "returnLossColumn", label: string) => (
    <SelectField label={label} options={columnOptions} error={errorOf(`mapping.${name}`)} {...form.register(`mapping.${name}`)} />
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Upload a sweep">
      {formMessage && <Notice tone="danger">{formMessage}</Notice>}
      <div className="mb-4">
        <label htmlFor="sweep-file" className="block font-bold text-slate-800">
          Sweep file
        </label>
        <p id="sweep-file-hint" className="text-sm text-slate-600">
          CSV or whitespace-separated text with a frequency column (Hz, kHz or MHz) and SWR, R and X, or return loss; with or without a header. At most 1 MB,{" "}
          {SWEEP_LIMITS.minPoints}–{SWEEP_LIMITS.maxPoints} points, {SWEEP_LIMITS.minMHz}–{SWEEP_LIMITS.maxMHz} MHz.
        </p>
        <input id="sweep-file" type="file" accept=".csv,.txt,.tsv,.dat,.prn,text/plain,text/csv" onChange={chooseFile} aria-describedby="sweep-file-hint" className="mt-1 block min-h-11" />
        {fileProblems.length > 0 && (
          <div role="alert" className="mt-2 text-sm font-bold text-danger-600">
            <p>Nothing was stored. The file has these problems:</p>
            <ul className="list-disc pl-5" aria-label="Problems in the file">
              {fileProblems.map((problem) => (
                <li key={problem}>{problem}</li>
              ))}
            </ul>
          </div>
        )}
      </div>

      {table && (
        <fieldset className="mb-4 rounded-lg border border-slate-300 p-4">
          <legend className="px-1 font-bold">Columns found</legend>
          {notes.length > 0 && (
            <ul className="mb-3 list-disc pl-5 text-sm text-slate-700">
              {notes.map((note) => (
                <li key={note}>{note}</li>
              ))}
            </ul>
          )}
          <div className="mb-3 overflow-x-auto">
            <table className={tableClass} aria-label="The file's first rows">
              <thead>
                <tr>
                  <th scope="col">Line</th>
                  {table.columns.map((c) => (
                    <th scope="col" key={c.index}>
                      {c.index + 1}
                      {c.name ? `: ${c.name}` : ""}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {table.rows.slice(0, PREVIEW_ROWS).map((row) => (
                  <tr key={row.line}>
                    <th scope="row">{row.line}</th>
                    {row.values.map((value, index) => (
                      <td key={index}>{value}</td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
            <p className="mt-1 text-sm text-slate-700">{table.rows.length} rows of numbers in all.</p>
          </div>
          <div className="grid gap-x-4 sm:grid-cols-3">
            {columnField("frequencyColumn", "Frequency column")}
            <SelectField label="Frequency unit" options={FREQUENCY_UNITS.map((unit) => ({ value: unit, label: unit }))} error={errorOf("mapping.frequencyUnit")} {...form.register("mapping.frequencyUnit")} />
            <SelectField
              label="The file measures"
              options={SWEEP_QUANTITIES.map((value) => ({ value, label: QUANTITY_LABELS[value] }))}
              error={errorOf("mapping.quantity")}
              {...form.register("mapping.quantity")}
            />
            {quantity === "swr" && columnField("swrColumn", "SWR column")}
            {quantity === "impedance" && columnField("rColumn", "R column")}
            {quantity === "impedance" && columnField("xColumn", "X column")}
            {quantity === "return-loss" && columnField("returnLossColumn", "Return loss column")}
          </div>
          {reading && (
            <div role="status" aria-live="polite" className="text-sm">
              {reading.points ? (
                <p className="font-bold text-copper-800" data-figure="preview-points">
                  Read with these columns: {reading.points.length} points from {reading.points[0].mhz.toFixed(4)} to {reading.points[reading.points.length - 1].mhz.toFixed(4)} MHz.
                </p>
              ) : (
                <div className="font-bold text-danger-600">
                  <p>With these columns the file does not read:</p>
                  <ul className="list-disc pl-5">
                    {reading.problems.map((problem) => (
                      <li key={problem}>{problem}</li>
                    ))}
                  </ul>
                </div>
              )}
            </div>
          )}
        </fieldset>
      )}

      <fieldset className="mb-4">
        <legend className="font-bold text-slate-800">Where the analyser was connected</legend>
        {SWEEP_PLACES.map((place) => (
          <label key={place} className="flex min-h-11 items-center gap-3">
            <input type="radio" value={place} className="size-5 accent-copper-700" {...form.register("place")} />
            {place === "feed-point" ? "At the feed point (on the coax side of the balun or unun)" : `At the radio end of the feedline (${feedline})`}
          </label>
        ))}
        {errorOf("place") && (
          <p className="text-sm font-bold text-danger-600" role="alert">
            {errorOf("place")}
          </p>
        )}
      </fieldset>

      <div className="grid gap-x-4 sm:grid-cols-2">
        <SelectField
          label="Analyser"
          options={[{ value: "", label: "My own (not from the gear shelf)" }, ...analysers.map((a) => ({ value: a.id, label: `${a.labelCode}: ${a.name} (${a.minMhz}–${a.maxMhz} MHz)` }))]}
          error={errorOf("analyserId")}
          {...form.register("analyserId")}
        />
        <TextField label="Measured at" type="datetime-local" hint="Club time" error={errorOf("measuredAt")} {...form.register("measuredAt")} />
        {lengths.fields.map((field, index) => (
          <TextField
            key={field.id}
            label={`Length as built, ${elements[index]} element (m)`}
            hint="The whole element, insulator eye to eye; blank for the plan's cut length"
            inputMode="decimal"
            error={errorOf(`builtLengths.${index}.value`)}
            {...form.register(`builtLengths.${index}.value` as const)}
          />
        ))}
      </div>
      <TextAreaField label="Note (optional)" rows={2} error={errorOf("note")} {...form.register("note")} />
      <Button type="submit" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Uploading…" : "Upload the sweep"}
      </Button>
    </form>
  );
}
