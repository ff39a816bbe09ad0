"use client";

// The antenna plan screen, on the antenna bench (no slot) and on a station slot's plan page:
// a form for the family and its settings that recomputes the plan in a Web Worker as the
// inputs change, the results beside it, and saving to the slot or to the plan library.
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useMemo, useState, type FormEvent } from "react";
import { useForm, useWatch, type Path } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { TextAreaField, TextField, SelectField } from "@/components/ui/field";
import { Card, Notice } from "@/components/ui/notice";
import type { ItuRegion } from "@/lib/antenna/bands";
import { MODE_DUTY } from "@/lib/antenna/exposure";
import { groundClass } from "@/lib/antenna/ground-classes";
import type { FamilyId, PlanRequestInput } from "@/lib/antenna/plan-schema";
import { planRequestForSlot, slotPlanParamsOf, type SiteGround, type SlotMode, type SlotPlanParamsInput } from "@/lib/antenna-days/slot-plan";
import type { Point } from "@/lib/site-plan/geometry";
import type { FeedlineTypeId } from "@/lib/antenna/feedline-types";
import { withFeedline } from "@/lib/station-kits/run-figures";
import { formOfRequest, requestOfForm, type PlanFormValues } from "@/lib/plan-screen/form-values";
import { formatDistance, type Units } from "@/lib/plan-screen/format";
import type { ActionResult } from "@/server/action";
import type { MeasuredOverlay } from "./charts";
import { engineResolver, requestProblems, type PlanProblem } from "./engine-resolver";
import { PlanFormFields } from "./plan-form-fields";
import { PlanResults } from "./plan-results";
import { usePlanWorker } from "./use-plan-worker";

/** Long enough to let a number be typed, short enough to follow a changing value. */
const RECOMPUTE_DELAY_MS = 300;

export interface SlotPlanContext {
  slotId: string;
  dayId: string;
  slotName: string;
  dayTitle: string;
  bands: string[];
  powerW: number;
  mode: SlotMode;
  position: Point;
  tent: Point;
  feedlineRunOverrideM: number | null;
  siteName: string;
  siteGround: SiteGround;
  /** The coax run booked as the slot's feedline: the plan is computed with it instead of the slot's own run. */
  feedline: { text: string; type: FeedlineTypeId; lengthM: number } | null;
  libraryPlanId: string | null;
  /** Coordinators may save the plan to the slot while the day is open; others try changes without saving. */
  canSave: boolean;
  /** Why the plan cannot be saved here, shown instead of the save button. */
  readOnlyReason: string;
  saveToSlot: (input: { slotId: string; planParams: SlotPlanParamsInput; libraryPlanId: string | null }) => Promise<ActionResult>;
}

export interface LibraryChoice {
  id: string;
  name: string;
  family: FamilyId;
  parameters: PlanRequestInput;
}

interface PlanScreenProps {
  units: Units;
  region: ItuRegion;
  initialValues: PlanFormValues;
  slot?: SlotPlanContext;
  library: LibraryChoice[];
  /** The library plan the starting values came from, if any. */
  initialLibraryPlanId?: string | null;
  saveToLibrary?: (input: { name: string; notes: string; parameters: PlanRequestInput }) => Promise<ActionResult<{ id: string }>>;
  /** A measured sweep to draw over the predicted curves. */
  measured?: MeasuredOverlay;
}

function groundLabel(ground: SiteGround): string {
  if (ground.groundClass === "custom") return `custom: σ = ${ground.groundConductivitySm} S/m, εr = ${ground.groundRelativePermittivity}`;
  return groundClass(ground.groundClass).label;
}

export function PlanScreen({ units, region, initialValues, slot, library, initialLibraryPlanId = null, saveToLibrary, measured }: PlanScreenProps) {
  const router = useRouter();
  // The plan as the slot stores it (with its own line type and run), and as computed: through the booked coax run if any.
  const plannedRequest = useCallback(
    (values: PlanFormValues): PlanRequestInput => {
      const request = requestOfForm(values, region);
      if (!slot) return request;
      return planRequestForSlot(
        { bands: slot.bands, powerW: slot.powerW, mode: slot.mode, planParams: slotPlanParamsOf(request), position: slot.position, tent: slot.tent, feedlineRunOverrideM: slot.feedlineRunOverrideM },
        slot.siteGround,
        region,
      );
    },
    [region, slot],
  );
  const toRequest = useCallback(
    (values: PlanFormValues): PlanRequestInput => (slot?.feedline ? withFeedline(plannedRequest(values), slot.feedline) : plannedRequest(values)),
    [plannedRequest, slot],
  );
  const form = useForm<PlanFormValues>({ defaultValues: initialValues, resolver: engineResolver(toRequest), mode: "onChange" });
  const values = useWatch({ control: form.control }) as PlanFormValues;
  const request = useMemo(() => toRequest(values), [toRequest, values]);
  const problems = useMemo(() => requestProblems(request), [request]);
  const requestKey = JSON.stringify(request);
  const engine = usePlanWorker();
  const { compute } = engine;

  useEffect(() => {
    if (problems.length > 0) return;
    const timer = setTimeout(() => compute(JSON.parse(requestKey)), RECOMPUTE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [requestKey, problems.length, compute]);

  // The plan's own parameters (what a library plan supplies): a slot keeps pointing at the
  // library plan it came from only while they are unchanged.
  const ownParams = (formValues: PlanFormValues) => JSON.stringify(slotPlanParamsOf(requestOfForm(formValues, region)));
  const [source, setSource] = useState<{ id: string; params: string } | null>(initialLibraryPlanId ? { id: initialLibraryPlanId, params: ownParams(initialValues) } : null);
  const libraryPlanId = source && source.params === ownParams(values) ? source.id : null;

  const loadLibraryPlan = (id: string) => {
    const chosen = library.find((plan) => plan.id === id);
    if (!chosen) return;
    const next = formOfRequest(chosen.parameters, form.getValues());
    form.reset(next);
    setSource({ id: chosen.id, params: ownParams(next) });
  };

  // Problems on what the slot or its site owns have no field in this form: list them.
  const fieldless = slot ? problems.filter((problem) => /^(band|bands|centreMHz|region|ground|customGround|transmitter|feedline\.lengthM)/.test(problem.path)) : [];

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(18rem,1fr)_2fr]">
      <div>
        {slot && (
          <Card title="From the station slot">
            <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
              <dt className="font-bold">Bands</dt>
              <dd data-figure="slot-bands">{slot.bands.join(", ")}</dd>
              <dt className="font-bold">Power and mode</dt>
              <dd>
                {slot.powerW} W, {MODE_DUTY[slot.mode].label}
              </dd>
              <dt className="font-bold">Ground</dt>
              <dd>
                {groundLabel(slot.siteGround)} ({slot.siteName})
              </dd>
              <dt className="font-bold">Feedline run</dt>
              <dd data-figure="feedline-run">
                {formatDistance(request.feedline.lengthM, units)}
                {slot.feedline ? " (the booked coax run)" : slot.feedlineRunOverrideM === null ? " (tent distance + mast + slack)" : " (set by the coordinator)"}
              </dd>
            </dl>
            {slot.feedline && (
              <p className="mt-2 text-sm" data-figure="slot-feedline">
                <span className="font-bold">feedline: {slot.feedline.text}</span>, booked for this slot on the station kits page.
              </p>
            )}
            <p className="mt-3 text-sm">
              <Link href={`/antenna-days/${slot.dayId}`}>Back to {slot.dayTitle}</Link>
            </p>
          </Card>
        )}
        <Card title={slot ? `Antenna plan for ${slot.slotName}` : "Antenna plan"}>
          {library.length > 0 && (
            <SelectField
              label="Start from a library plan"
              options={[{ value: "", label: "Choose a saved plan…" }, ...library.map((plan) => ({ value: plan.id, label: plan.name }))]}
              value=""
              onChange={(event) => loadLibraryPlan(event.target.value)}
            />
          )}
          {libraryPlanId && <p className="mb-3 text-sm text-slate-700">From the plan library: {library.find((plan) => plan.id === libraryPlanId)?.name}.</p>}
          <form noValidate aria-label="Antenna plan" onSubmit={(event) => event.preventDefault()}>
            <PlanFormFields form={form} region={region} units={units} siteFields={!slot} bookedFeedline={slot?.feedline?.text} />
          </form>
          {fieldless.length > 0 && <ProblemList title="The slot's settings do not make a plan" problems={fieldless} />}
          {slot &&
            (slot.canSave ? (
              <SaveToSlot slot={slot} values={values} plannedRequest={plannedRequest} libraryPlanId={libraryPlanId} disabled={problems.length > 0} form={form} onSaved={() => router.refresh()} />
            ) : (
              <p className="text-sm text-slate-700">{slot.readOnlyReason}</p>
            ))}
          {saveToLibrary && <SaveToLibrary request={request} disabled={problems.length > 0} save={saveToLibrary} />}
        </Card>
      </div>
      <div>
        <p className="mb-3 min-h-6 text-sm text-slate-700" role="status" aria-live="polite" data-state={engine.computing ? "computing" : "idle"}>
          {problems.length > 0
            ? "Fix the marked settings to recompute."
            : engine.computing
              ? "Computing…"
              : engine.elapsedMs !== null
                ? `Computed in ${Math.round(engine.elapsedMs)} ms.`
                : ""}
        </p>
        {engine.problems.length > 0 && <ProblemList title="The engine cannot plan this antenna" problems={engine.problems.map(splitProblem)} />}
        {engine.result ? (
          <div className={problems.length > 0 || engine.problems.length > 0 ? "opacity-60" : ""}>
            <PlanResults result={engine.result} units={units} measured={measured} />
          </div>
        ) : (
          problems.length === 0 && <p className="text-slate-700">Computing the plan…</p>
        )}
      </div>
    </div>
  );
}

function splitProblem(line: string): PlanProblem {
  const split = line.indexOf(": ");
  return split < 0 ? { path: "", message: line } : { path: line.slice(0, split), message: line.slice(split + 2) };
}

function ProblemList({ title, problems }: { title: string; problems: PlanProblem[] }) {
  return (
    <Notice tone="danger" title={title}>
      <ul className="list-disc pl-5">
        {problems.map((problem) => (
          <li key={`${problem.path}:${problem.message}`}>
            {problem.path ? <code>{problem.path}</code> : null} {problem.message}
          </li>
        ))}
      </ul>
    </Notice>
  );
}

interface SaveToSlotProps {
  slot: SlotPlanContext;
  values: PlanFormValues;
  plannedRequest: (values: PlanFormValues) => PlanRequestInput;
  libraryPlanId: string | null;
  disabled: boolean;
  form: ReturnType<typeof useForm<PlanFormValues>>;
  onSaved: () => void;
}

function SaveToSlot({ slot, values, plannedRequest, libraryPlanId, disabled, form, onSaved }: SaveToSlotProps) {
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [saving, setSaving] = useState(false);
  const save = async () => {
    setSaving(true);
    setMessage(null);
    const result = await slot.saveToSlot({ slotId: slot.slotId, planParams: slotPlanParamsOf(plannedRequest(values)), libraryPlanId });
    setSaving(false);
    const unplaced: string[] = [];
    for (const [field, text] of Object.entries(result.fieldErrors ?? {})) {
      if (field.startsWith("planParams.") && field !== "planParams.feedlineType") form.setError(field.slice("planParams.".length) as Path<PlanFormValues>, { type: "server", message: text });
      else if (field === "planParams.feedlineType") form.setError("feedline.type", { type: "server", message: text });
      else unplaced.push(text);
    }
    if (result.ok) onSaved();
    setMessage({ ok: result.ok, text: result.message ?? (unplaced.join(" ") || "Check the marked settings.") });
  };
  return (
    <div className="mt-2 border-t border-slate-200 pt-4">
      {message && <Notice tone={message.ok ? "success" : "danger"}>{message.text}</Notice>}
      <Button onClick={save} disabled={disabled || saving}>
        {saving ? "Saving…" : "Save this plan to the slot"}
      </Button>
    </div>
  );
}

function SaveToLibrary({ request, disabled, save }: { request: PlanRequestInput; disabled: boolean; save: NonNullable<PlanScreenProps["saveToLibrary"]> }) {
  const [name, setName] = useState("");
  const [notes, setNotes] = useState("");
  const [saving, setSaving] = useState(false);
  const [result, setResult] = useState<ActionResult<{ id: string }> | null>(null);
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setSaving(true);
    const answer = await save({ name, notes, parameters: request });
    setSaving(false);
    setResult(answer);
    if (answer.ok) setName("");
  };
  const fieldError = (field: string) => result?.fieldErrors?.[field];
  return (
    <form onSubmit={submit} noValidate aria-label="Save to the plan library" className="mt-4 border-t border-slate-200 pt-4">
      <h3 className="mb-2 font-bold">Save to the plan library</h3>
      {result?.message && (
        <Notice tone={result.ok ? "success" : "danger"}>
          {result.message} {result.ok && result.data && <Link href={`/bench/library/${result.data.id}`}>Open it in the library</Link>}
        </Notice>
      )}
      <TextField label="Plan name" value={name} onChange={(event) => setName(event.target.value)} error={fieldError("name")} maxLength={80} />
      <TextAreaField label="Notes (optional)" value={notes} onChange={(event) => setNotes(event.target.value)} error={fieldError("notes")} rows={2} />
      {Object.entries(result?.fieldErrors ?? {})
        .filter(([field]) => field.startsWith("parameters"))
        .map(([field, text]) => (
          <p key={field} className="mb-2 text-sm font-bold text-danger-600" role="alert">
            {field}: {text}
          </p>
        ))}
      <Button type="submit" variant="secondary" disabled={disabled || saving}>
        {saving ? "Saving…" : "Save to the library"}
      </Button>
    </form>
  );
}
