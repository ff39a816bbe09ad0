"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { checkSitePlan, type BandRange, type Finding } from "@/lib/site-plan/checks";
import { footprint, type AntennaSummary, type Footprint } from "@/lib/site-plan/footprint";
import type { Point } from "@/lib/site-plan/geometry";
import { hazardKindLabels, type Hazard } from "@/lib/site-plan/hazards";

export interface PlanSlot {
  id: string;
  name: string;
  bands: BandRange[];
  x: number;
  y: number;
  azimuthDeg: number;
  tentX: number;
  tentY: number;
  summary: AntennaSummary;
}

export interface PlanSite {
  name: string;
  widthM: number;
  depthM: number;
  hazards: Hazard[];
}

const COLOURS = {
  wire: "#9c5d26", // copper-600
  mast: "#7f4a1f", // copper-700
  structure: "#334155", // slate-700
  faint: "#94a3b8", // slate-400
  grid: "#e2e8f0", // slate-200
  caution: "#b45309", // caution-600
  danger: "#b91c1c", // danger-600
};

const NICE_STEPS = [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000];
const niceStep = (span: number, lines: number) => NICE_STEPS.find((step) => span / step <= lines) ?? 1000;
const round = (value: number, step = 0.5) => Math.round(value / step) * step;
const clamp = (value: number, low: number, high: number) => Math.min(high, Math.max(low, value));
const metres = (value: number) => `${Number(value.toFixed(1))} m`;

async function moveSlot(slotId: string, position: { x: number; y: number }) {
  const response = await fetch(`/api/slots/${slotId}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify(position) });
  const answer = await response.json().catch(() => null);
  if (!response.ok) throw new Error(answer?.message ?? "The slot could not be moved.");
  return answer;
}

/**
 * The scaled site plan: metres grid, north arrow, scale bar, hazards and every station slot
 * with its antenna, guys, exposure zone and fall zone. Coordinators drag a mast with the mouse
 * or move the selected one with the arrow keys (1 m, or 5 m with Shift) or the position form.
 * The checks run here on every move; the server keeps the saved position.
 */
export function SitePlan({ site, slots, editable }: { site: PlanSite; slots: PlanSlot[]; editable: boolean }) {
  const router = useRouter();
  const svgRef = useRef<SVGSVGElement>(null);
  const titleId = useId();
  // Moves made here; a slot without one stands where the server has it.
  const [moves, setMoves] = useState<Record<string, Point>>({});
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [dragging, setDragging] = useState<string | null>(null);
  const [announcement, setAnnouncement] = useState("");
  const saveTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);

  const positionOf = (slotId: string): Point => {
    const slot = slots.find((candidate) => candidate.id === slotId)!;
    return moves[slotId] ?? [slot.x, slot.y];
  };
  const moveTo = (slotId: string, position: Point) => setMoves((current) => ({ ...current, [slotId]: position }));

  const mutation = useMutation({
    mutationFn: ({ slotId, position }: { slotId: string; position: Point }) => moveSlot(slotId, { x: position[0], y: position[1] }),
    onSuccess: (_answer, { slotId, position }) => {
      const slot = slots.find((candidate) => candidate.id === slotId);
      setAnnouncement(`${slot?.name} saved at ${metres(position[0])} east, ${metres(position[1])} north.`);
      router.refresh();
    },
    onError: (error, { slotId }) => {
      setMoves((current) => Object.fromEntries(Object.entries(current).filter(([id]) => id !== slotId)));
      setAnnouncement(error.message);
    },
  });

  const save = (slotId: string, position: Point, delayMs = 0) => {
    clearTimeout(saveTimer.current);
    saveTimer.current = setTimeout(() => mutation.mutate({ slotId, position }), delayMs);
  };

  const placed = useMemo(
    () =>
      slots.map((slot) => {
        const position = moves[slot.id] ?? ([slot.x, slot.y] as Point);
        return { slot, position, footprint: footprint(slot.summary, { position, azimuthDeg: slot.azimuthDeg }) };
      }),
    [slots, moves],
  );
  const findings = useMemo(
    () => checkSitePlan(site.hazards, placed.map(({ slot, footprint }) => ({ id: slot.id, name: slot.name, bands: slot.bands, footprint }))),
    [site.hazards, placed],
  );
  const errorSlots = new Set(findings.filter((finding) => finding.severity === "error").flatMap((finding) => finding.slotIds));
  const warningSlots = new Set(findings.filter((finding) => finding.severity === "warning").flatMap((finding) => finding.slotIds));
  const errorHazards = new Set(findings.filter((finding) => finding.severity === "error").map((finding) => finding.hazardIndex));

  const { widthM: W, depthM: D } = site;
  const span = Math.max(W, D);
  const margin = span * 0.1;
  const text = span / 45;
  const flip = (point: Point): Point => [point[0], D - point[1]];
  const grid = niceStep(span, 16);
  const scaleBar = niceStep(span / 5, 1);

  const toSite = (clientX: number, clientY: number): Point | null => {
    const svg = svgRef.current;
    const matrix = svg?.getScreenCTM();
    if (!svg || !matrix) return null;
    const point = new DOMPoint(clientX, clientY).matrixTransform(matrix.inverse());
    return [round(clamp(point.x, 0, W)), round(clamp(D - point.y, 0, D))];
  };

  const onPointerDown = (slotId: string) => (event: PointerEvent<SVGGElement>) => {
    if (!editable) return;
    event.preventDefault();
    (event.currentTarget as Element).setPointerCapture(event.pointerId);
    setSelectedId(slotId);
    setDragging(slotId);
  };
  const onPointerMove = (event: PointerEvent<SVGGElement>) => {
    if (!dragging) return;
    const point = toSite(event.clientX, event.clientY);
    if (point) moveTo(dragging, point);
  };
  const onPointerUp = () => {
    if (!dragging) return;
    save(dragging, positionOf(dragging));
    setDragging(null);
  };

  const onKeyDown = (slotId: string) => (event: KeyboardEvent<SVGGElement>) => {
    const steps: Record<string, Point> = { ArrowUp: [0, 1], ArrowDown: [0, -1], ArrowLeft: [-1, 0], ArrowRight: [1, 0] };
    if (event.key === "Enter" || event.key === " ") {
      event.preventDefault();
      setSelectedId(slotId);
      return;
    }
    const step = steps[event.key];
    if (!step || !editable) return;
    event.preventDefault();
    setSelectedId(slotId);
    const distance = event.shiftKey ? 5 : 1;
    const [x, y] = positionOf(slotId);
    const next: Point = [clamp(x + step[0] * distance, 0, W), clamp(y + step[1] * distance, 0, D)];
    moveTo(slotId, next);
    setAnnouncement(`${metres(next[0])} east, ${metres(next[1])} north.`);
    save(slotId, next, 600);
  };

  const selected = placed.find(({ slot }) => slot.id === selectedId);

  return (
    <div>
      <div className="overflow-hidden rounded-lg border border-slate-300 bg-white">
        <svg
          ref={svgRef}
          viewBox={`${-margin} ${-margin} ${W + 2 * margin} ${D + 2 * margin}`}
          className="block h-auto w-full select-none"
          role="group"
          aria-labelledby={titleId}
          data-width-m={W}
          data-depth-m={D}
          onPointerMove={onPointerMove}
          onPointerUp={onPointerUp}
          onPointerCancel={onPointerUp}
        >
          <title id={titleId}>{`Site plan of ${site.name}, ${W} by ${D} metres, north up`}</title>
          <Grid W={W} D={D} step={grid} text={text} />
          <rect x={0} y={0} width={W} height={D} fill="none" stroke={COLOURS.structure} strokeWidth={2} vectorEffect="non-scaling-stroke" />
          {site.hazards.map((hazard, index) => (
            <HazardShape key={index} hazard={hazard} flip={flip} text={text} alarm={errorHazards.has(index)} />
          ))}
          {placed.map(({ slot, position, footprint }) => (
            <SlotDrawing
              key={slot.id}
              slot={slot}
              position={position}
              footprint={footprint}
              flip={flip}
              text={text}
              state={errorSlots.has(slot.id) ? "error" : warningSlots.has(slot.id) ? "warning" : "clear"}
              selected={slot.id === selectedId}
              editable={editable}
              onPointerDown={onPointerDown(slot.id)}
              onKeyDown={onKeyDown(slot.id)}
              onFocus={() => setSelectedId(slot.id)}
            />
          ))}
          <NorthArrow x={W + margin * 0.5} y={-margin * 0.15} size={margin * 0.6} text={text} />
          <g aria-hidden="true">
            <line x1={0} y1={D + margin * 0.55} x2={scaleBar} y2={D + margin * 0.55} stroke={COLOURS.structure} strokeWidth={3} vectorEffect="non-scaling-stroke" />
            <text x={scaleBar / 2} y={D + margin * 0.55 + text * 1.2} fontSize={text} textAnchor="middle" fill={COLOURS.structure}>
              {scaleBar} m
            </text>
          </g>
        </svg>
      </div>
      <p aria-live="polite" className="mt-2 min-h-6 text-sm text-slate-700">
        {announcement}
      </p>
      <PlanLegend editable={editable} />
      {editable && (
        <MoveForm
          key={selected ? `${selected.slot.id}:${selected.position.join(",")}` : "none"}
          slotName={selected?.slot.name}
          position={selected?.position}
          site={site}
          onMove={(position) => {
            if (!selected) return;
            moveTo(selected.slot.id, position);
            save(selected.slot.id, position);
          }}
        />
      )}
      {slots.length > 0 && <FindingList findings={findings} hazards={site.hazards} />}
    </div>
  );
}

function Grid({ W, D, step, text }: { W: number; D: number; step: number; text: number }) {
  const xs = Array.from({ length: Math.floor(W / step) + 1 }, (_, i) => i * step);
  const ys = Array.from({ length: Math.floor(D / step) + 1 }, (_, i) => i * step);
  return (
    <g aria-hidden="true">
      {xs.map((x) => (
        <g key={`x${x}`}>
          <line x1={x} y1={0} x2={x} y2={D} stroke={COLOURS.grid} strokeWidth={1} vectorEffect="non-scaling-stroke" />
          <text x={x} y={D + text * 1.3} fontSize={text * 0.8} textAnchor="middle" fill={COLOURS.faint}>
            {x}
          </text>
        </g>
      ))}
      {ys.map((y) => (
        <g key={`y${y}`}>
          <line x1={0} y1={D - y} x2={W} y2={D - y} stroke={COLOURS.grid} strokeWidth={1} vectorEffect="non-scaling-stroke" />
          <text x={-text * 0.4} y={D - y + text * 0.3} fontSize={text * 0.8} textAnchor="end" fill={COLOURS.faint}>
            {y}
          </text>
        </g>
      ))}
    </g>
  );
}

function NorthArrow({ x, y, size, text }: { x: number; y: number; size: number; text: number }) {
  return (
    <g aria-label="North is up" role="img">
      <path d={`M ${x} ${y} L ${x + size * 0.3} ${y + size} L ${x} ${y + size * 0.75} L ${x - size * 0.3} ${y + size} Z`} fill={COLOURS.structure} />
      <text x={x} y={y + size + text * 1.1} fontSize={text} textAnchor="middle" fontWeight="bold" fill={COLOURS.structure}>
        N
      </text>
    </g>
  );
}

const pointsAttr = (points: readonly Point[], flip: (point: Point) => Point) => points.map((point) => flip(point).join(",")).join(" ");

function HazardShape({ hazard, flip, text, alarm }: { hazard: Hazard; flip: (point: Point) => Point; text: number; alarm: boolean }) {
  const [lx, ly] = flip(hazard.points[0]);
  const label = "heightM" in hazard ? `${hazard.label} (${hazard.heightM} m)` : hazard.label;
  const caption = (
    <text x={lx} y={ly - text * 0.5} fontSize={text * 0.85} fill={hazard.kind === "power-line" ? COLOURS.danger : COLOURS.structure}>
      {label}
    </text>
  );
  const name = `${hazardKindLabels[hazard.kind]}: ${label}`;
  switch (hazard.kind) {
    case "power-line":
      return (
        <g role="img" aria-label={name}>
          <polyline points={pointsAttr(hazard.points, flip)} fill="none" stroke={COLOURS.danger} strokeWidth={alarm ? 6 : 4} strokeDasharray="12 4 2 4" vectorEffect="non-scaling-stroke" />
          {caption}
        </g>
      );
    case "path":
      return (
        <g role="img" aria-label={name}>
          <polyline points={pointsAttr(hazard.points, flip)} fill="none" stroke={COLOURS.faint} strokeWidth={6} strokeLinecap="round" vectorEffect="non-scaling-stroke" />
          {caption}
        </g>
      );
    case "public-area":
      return (
        <g role="img" aria-label={name}>
          <polygon points={pointsAttr(hazard.points, flip)} fill={COLOURS.faint} fillOpacity={0.2} stroke={COLOURS.faint} strokeWidth={2} strokeDasharray="6 4" vectorEffect="non-scaling-stroke" />
          {caption}
        </g>
      );
    case "building":
      return (
        <g role="img" aria-label={name}>
          <polygon points={pointsAttr(hazard.points, flip)} fill={COLOURS.faint} fillOpacity={0.6} stroke={COLOURS.structure} strokeWidth={1.5} vectorEffect="non-scaling-stroke" />
          {caption}
        </g>
      );
    case "tree":
      return (
        <g role="img" aria-label={name}>
          {/* Canopy drawn at a quarter of the height, a typical spread for the plan's scale. */}
          <circle cx={lx} cy={ly} r={Math.max(1, hazard.heightM / 4)} fill="#64748b" fillOpacity={0.35} stroke={COLOURS.structure} strokeWidth={1} vectorEffect="non-scaling-stroke" />
          {caption}
        </g>
      );
  }
}

interface SlotDrawingProps {
  slot: PlanSlot;
  position: Point;
  footprint: Footprint;
  flip: (point: Point) => Point;
  text: number;
  state: "error" | "warning" | "clear";
  selected: boolean;
  editable: boolean;
  onPointerDown: (event: PointerEvent<SVGGElement>) => void;
  onKeyDown: (event: KeyboardEvent<SVGGElement>) => void;
  onFocus: () => void;
}

function SlotDrawing({ slot, position, footprint, flip, text, state, selected, editable, onPointerDown, onKeyDown, onFocus }: SlotDrawingProps) {
  const [mx, my] = flip(position);
  const [tx, ty] = flip([slot.tentX, slot.tentY]);
  const bands = slot.bands.map((band) => band.name).join(", ");
  const label = `${slot.name}, ${bands}, mast at ${metres(position[0])} east, ${metres(position[1])} north${state === "error" ? ", has an error" : state === "warning" ? ", has warnings" : ""}`;
  return (
    <g>
      {/* Fall zone: red when it reaches a power line. */}
      <circle cx={mx} cy={my} r={footprint.fallZoneRadiusM} fill="none" stroke={state === "error" ? COLOURS.danger : COLOURS.faint} strokeWidth={state === "error" ? 3 : 1.5} strokeDasharray="8 6" vectorEffect="non-scaling-stroke" data-testid={`fall-zone-${slot.id}`} />
      {/* RF-exposure zone: everything within the exposure distance of a conductor. */}
      <g opacity={0.3} aria-hidden="true">
        {footprint.wires.map((wire, index) => {
          const [x1, y1] = flip(wire.from);
          const [x2, y2] = flip(wire.to);
          return <line key={index} x1={x1} y1={y1} x2={x2} y2={y2} stroke={COLOURS.caution} strokeWidth={2 * footprint.exposureDistanceM} strokeLinecap="round" />;
        })}
        <circle cx={mx} cy={my} r={footprint.exposureDistanceM} fill={COLOURS.caution} />
      </g>
      {/* Feedline to the operating tent. */}
      <line x1={mx} y1={my} x2={tx} y2={ty} stroke={COLOURS.structure} strokeWidth={1.5} strokeDasharray="2 4" vectorEffect="non-scaling-stroke" aria-hidden="true" />
      <rect x={tx - text * 0.5} y={ty - text * 0.5} width={text} height={text} fill="white" stroke={COLOURS.structure} strokeWidth={1.5} vectorEffect="non-scaling-stroke" aria-hidden="true" />
      {/* Guys and anchors. */}
      {footprint.guyAnchors.map((anchor, index) => {
        const [ax, ay] = flip(anchor);
        return (
          <g key={index} aria-hidden="true">
            <line x1={mx} y1={my} x2={ax} y2={ay} stroke={COLOURS.faint} strokeWidth={1} vectorEffect="non-scaling-stroke" />
            <rect x={ax - text * 0.2} y={ay - text * 0.2} width={text * 0.4} height={text * 0.4} fill={COLOURS.structure} />
          </g>
        );
      })}
      {/* The antenna's wires (radials for a vertical). */}
      {footprint.wires.map((wire, index) => {
        const [x1, y1] = flip(wire.from);
        const [x2, y2] = flip(wire.to);
        return <line key={index} x1={x1} y1={y1} x2={x2} y2={y2} stroke={COLOURS.wire} strokeWidth={3} strokeLinecap="round" vectorEffect="non-scaling-stroke" aria-hidden="true" />;
      })}
      {/* Only a draggable mast takes touches from the page; elsewhere the plan scrolls with the page. */}
      <g
        role={editable ? "button" : "img"}
        tabIndex={0}
        aria-label={label}
        aria-pressed={editable ? selected : undefined}
        data-slot-id={slot.id}
        className={editable ? "cursor-grab touch-none focus:outline-none" : "focus:outline-none"}
        onPointerDown={onPointerDown}
        onKeyDown={onKeyDown}
        onFocus={onFocus}
      >
        <circle cx={mx} cy={my} r={text * 1.2} fill="transparent" />
        <circle cx={mx} cy={my} r={text * 0.55} fill={state === "error" ? COLOURS.danger : COLOURS.mast} stroke={selected ? COLOURS.structure : "white"} strokeWidth={selected ? 4 : 2} vectorEffect="non-scaling-stroke" />
        <text x={mx + text * 0.9} y={my - text * 0.6} fontSize={text} fontWeight="bold" fill={COLOURS.structure}>
          {slot.name}
        </text>
      </g>
    </g>
  );
}

function PlanLegend({ editable }: { editable: boolean }) {
  const item = (swatch: ReactNode, label: string) => (
    <li className="flex items-center gap-2">
      <svg width="28" height="14" aria-hidden="true">
        {swatch}
      </svg>
      {label}
    </li>
  );
  return (
    <ul aria-label="Plan legend" className="mt-1 flex flex-wrap gap-x-5 gap-y-1 text-sm text-slate-700">
      {item(<circle cx="14" cy="7" r="5" fill={COLOURS.mast} />, editable ? "Mast (drag it, or Tab to it and use the arrow keys)" : "Mast")}
      {item(<line x1="0" y1="7" x2="28" y2="7" stroke={COLOURS.wire} strokeWidth="3" />, "Antenna wire or radial")}
      {item(<line x1="0" y1="7" x2="28" y2="7" stroke={COLOURS.caution} strokeOpacity="0.35" strokeWidth="10" />, "RF-exposure zone")}
      {item(<line x1="0" y1="7" x2="28" y2="7" stroke={COLOURS.faint} strokeWidth="2" strokeDasharray="6 4" />, "Fall zone")}
      {item(<rect x="10" y="3" width="8" height="8" fill={COLOURS.structure} />, "Guy anchor")}
      {item(<line x1="0" y1="7" x2="28" y2="7" stroke={COLOURS.danger} strokeWidth="3" strokeDasharray="8 3 2 3" />, "Power line")}
      {item(<rect x="8" y="1" width="12" height="12" fill="white" stroke={COLOURS.structure} />, "Operating tent")}
    </ul>
  );
}

function MoveForm({ slotName, position, site, onMove }: { slotName?: string; position?: Point; site: PlanSite; onMove: (position: Point) => void }) {
  const [x, setX] = useState(position ? String(position[0]) : "");
  const [y, setY] = useState(position ? String(position[1]) : "");
  const [error, setError] = useState<string | null>(null);
  if (!slotName || !position) {
    return <p className="mt-3 text-sm text-slate-600">Select a mast on the plan (click it or Tab to it) to move it with the arrow keys or by its position.</p>;
  }
  return (
    <form
      aria-label={`Position of ${slotName}`}
      className="mt-3 flex flex-wrap items-end gap-x-4 rounded-lg border border-slate-200 bg-slate-50 p-3"
      onSubmit={(event) => {
        event.preventDefault();
        const next: Point = [Number(x), Number(y)];
        if (!next.every(Number.isFinite) || next[0] < 0 || next[0] > site.widthM || next[1] < 0 || next[1] > site.depthM) {
          setError(`Keep the mast on the site: 0–${site.widthM} m east, 0–${site.depthM} m north.`);
          return;
        }
        setError(null);
        onMove(next);
      }}
    >
      <p className="mb-4 w-full font-bold">Move {slotName}</p>
      <div className="w-36">
        <TextField label="Metres east (x)" type="number" step="0.5" value={x} onChange={(event) => setX(event.target.value)} error={error ?? undefined} />
      </div>
      <div className="w-36">
        <TextField label="Metres north (y)" type="number" step="0.5" value={y} onChange={(event) => setY(event.target.value)} />
      </div>
      <div className="mb-4">
        <Button type="submit" variant="secondary">
          Move slot
        </Button>
      </div>
    </form>
  );
}

function FindingList({ findings, hazards }: { findings: Finding[]; hazards: Hazard[] }) {
  const errors = findings.filter((finding) => finding.severity === "error");
  const warnings = findings.filter((finding) => finding.severity === "warning");
  return (
    <section aria-label="Site plan checks" className="mt-4">
      <h3 className="font-bold">Checks</h3>
      <p className="text-sm text-slate-600" aria-live="polite">
        {findings.length === 0 ? "No problems found: fall zones clear the power lines, the public stays outside the exposure zones, and the stations are far enough apart." : `${errors.length} ${errors.length === 1 ? "error" : "errors"}, ${warnings.length} ${warnings.length === 1 ? "warning" : "warnings"}.`}
      </p>
      <ul className="mt-2 space-y-2">
        {findings.map((finding, index) => (
          <li
            key={`${finding.rule}-${finding.slotIds.join("-")}-${finding.hazardIndex ?? ""}-${index}`}
            className={`rounded-lg border-l-4 p-3 ${finding.severity === "error" ? "border-danger-600 bg-danger-50 text-danger-800" : "border-caution-600 bg-caution-50 text-caution-800"}`}
          >
            <p className="font-bold">
              {finding.severity === "error" ? "Error: " : "Warning: "}
              {finding.message}
            </p>
            <p className="text-sm">{finding.advice}</p>
            {finding.hazardIndex !== undefined && <p className="sr-only">Hazard: {hazards[finding.hazardIndex]?.label}</p>}
          </li>
        ))}
      </ul>
      <p className="mt-3 text-sm text-slate-600">Screening figures for planning. Local codes, permits, the landowner&apos;s rules and licensed practice prevail.</p>
    </section>
  );
}
