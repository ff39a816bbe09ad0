"use client";

// The plan screen's charts (recharts): SWR against frequency with the band edges marked and
// the 2:1 region shaded, R and X against frequency, and the current along each wire. Lines
// differ by dash pattern as well as colour, and every chart offers its numbers as a table.
// A measured sweep, when one is chosen, is drawn over the prediction with dotted lines.
import type { ReactNode } from "react";
import { CartesianGrid, Legend, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { PlanBand, WireCurrent } from "@/lib/antenna/plan";
import { BAND_WINDOW } from "@/lib/sweeps/analysis";
import type { SweepViews, ViewPoint } from "@/lib/sweeps/feed-point";
import { formatDistance, formatSwr, type Units } from "@/lib/plan-screen/format";
import { tableClass } from "./table-class";

const COPPER = "#7f4a1f";
const SLATE = "#334155";
const LIGHT_COPPER = "#d08447";
const MID_SLATE = "#64748b";
const STROKES = [
  { colour: COPPER, dash: undefined },
  { colour: SLATE, dash: "6 4" },
  { colour: LIGHT_COPPER, dash: "2 3" },
  { colour: MID_SLATE, dash: "10 3 2 3" },
];
/** SWR charts show 1 to 5: above that the exact figure matters little, and the table has it. */
const SWR_AXIS_TOP = 5;

const mhzTick = (mhz: number) => mhz.toFixed(mhz < 10 ? 3 : 2);

/** A measured sweep to draw over the prediction: its name in the legend and its two ends. */
export interface MeasuredOverlay {
  label: string;
  views: SweepViews;
}

/** The measured points of this band: those the comparison reads for it (its window around the centre). */
function measuredWithin(points: ViewPoint[], band: PlanBand): ViewPoint[] {
  return points.filter((point) => point.mhz >= band.centreMHz * (1 - BAND_WINDOW) && point.mhz <= band.centreMHz * (1 + BAND_WINDOW));
}

/** The frequency axis: the predicted sweep, widened to the measured points so a dip off the band still shows. */
function frequencyDomain(band: PlanBand, measured: { mhz: number }[][]): [number, number] {
  const all = [band.sweep[0].mhz, band.sweep[band.sweep.length - 1].mhz, ...measured.flatMap((points) => points.map((point) => point.mhz))];
  return [Math.min(...all), Math.max(...all)];
}

const measuredSwr = (points: ViewPoint[]) => points.flatMap((point) => (point.swr === null ? [] : [{ mhz: point.mhz, swr: point.swr }]));

const where = (measured: MeasuredOverlay, end: "feed-point" | "radio-end") => (measured.views.measuredAt === end ? "measured" : "from the measurement");

function ChartFigure({ title, description, table, children }: { title: string; description: string; table: ReactNode; children: ReactNode }) {
  return (
    <figure className="mb-6">
      <figcaption className="mb-1 font-bold text-slate-900">{title}</figcaption>
      <p className="mb-2 text-sm text-slate-700">{description}</p>
      <div className="h-64 w-full" aria-hidden="true">
        {children}
      </div>
      <details className="mt-2">
        <summary className="min-h-11 cursor-pointer py-2 font-bold text-copper-700">The numbers of this chart</summary>
        <div className="overflow-x-auto">{table}</div>
      </details>
    </figure>
  );
}

export function SwrChart({ band, transformerLabel, measured }: { band: PlanBand; transformerLabel: string; measured?: MeasuredOverlay }) {
  const data = band.sweep.map((point) => ({ mhz: point.mhz, feed: point.feed.swr, radio: point.radio.swr }));
  const name = band.band.name;
  const measuredFeed = measured ? measuredSwr(measuredWithin(measured.views.feed, band)) : [];
  const measuredRadio = measured ? measuredSwr(measuredWithin(measured.views.radio, band)) : [];
  return (
    <ChartFigure
      title={`SWR against frequency, ${name}`}
      description={`Solid: at the feed point, on the line after the ${transformerLabel}; dashed: at the radio end of the feedline.${measured ? ` Dotted: ${measured.label}, at the feed point (light) and at the radio (dark).` : ""} The shaded strip is 2:1 or better; the vertical lines are the band edges (${mhzTick(band.band.lowMHz)} and ${mhzTick(band.band.highMHz)} MHz).`}
      table={
        <table className={tableClass} aria-label={`SWR against frequency, ${name}`}>
          <thead>
            <tr>
              <th scope="col">MHz</th>
              <th scope="col">SWR at the feed point</th>
              <th scope="col">SWR at the radio</th>
              <th scope="col">Total loss (dB)</th>
            </tr>
          </thead>
          <tbody>
            {band.sweep.map((point) => (
              <tr key={point.mhz}>
                <th scope="row">{point.mhz.toFixed(4)}</th>
                <td>{formatSwr(point.feed.swr)}</td>
                <td>{formatSwr(point.radio.swr)}</td>
                <td>{point.totalLossDb.toFixed(2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke="#cbd5e1" strokeDasharray="2 4" />
          <ReferenceArea y1={1} y2={2} fill="#f5e3d3" fillOpacity={0.8} ifOverflow="hidden" label={{ value: "2:1 or better", position: "insideBottomRight", fill: SLATE, fontSize: 12 }} />
          <XAxis dataKey="mhz" type="number" domain={frequencyDomain(band, [measuredFeed, measuredRadio])} allowDataOverflow tickFormatter={mhzTick} tickCount={6} unit=" MHz" fontSize={12} />
          <YAxis domain={[1, SWR_AXIS_TOP]} allowDataOverflow ticks={[1, 1.5, 2, 3, 4, 5]} fontSize={12} width={36} />
          <ReferenceLine x={band.band.lowMHz} stroke={SLATE} strokeWidth={2} label={{ value: "band edge", position: "insideTopLeft", fill: SLATE, fontSize: 12 }} />
          <ReferenceLine x={band.band.highMHz} stroke={SLATE} strokeWidth={2} label={{ value: "band edge", position: "insideTopRight", fill: SLATE, fontSize: 12 }} />
          <Tooltip formatter={(value) => formatSwr(Number(value))} labelFormatter={(mhz) => `${Number(mhz).toFixed(4)} MHz`} />
          <Legend />
          <Line type="monotone" dataKey="feed" name="At the feed point" stroke={COPPER} strokeWidth={2.5} dot={false} isAnimationActive={false} />
          <Line type="monotone" dataKey="radio" name="At the radio" stroke={SLATE} strokeWidth={2.5} strokeDasharray="6 4" dot={false} isAnimationActive={false} />
          {measured && measuredFeed.length > 0 && (
            <Line data={measuredFeed} type="linear" dataKey="swr" name={`At the feed point, ${where(measured, "feed-point")}`} stroke={LIGHT_COPPER} strokeWidth={3} strokeDasharray="2 3" dot={false} isAnimationActive={false} />
          )}
          {measured && measuredRadio.length > 0 && (
            <Line data={measuredRadio} type="linear" dataKey="swr" name={`At the radio, ${where(measured, "radio-end")}`} stroke={MID_SLATE} strokeWidth={3} strokeDasharray="2 3" dot={false} isAnimationActive={false} />
          )}
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

export function ImpedanceChart({ band, measured }: { band: PlanBand; measured?: MeasuredOverlay }) {
  const data = band.sweep.map((point) => ({ mhz: point.mhz, r: point.feed.r, x: point.feed.x }));
  const name = band.band.name;
  const measuredFeed = measured?.views.hasImpedance ? measuredWithin(measured.views.feed, band) : [];
  return (
    <ChartFigure
      title={`Feed-point impedance against frequency, ${name}`}
      description={`Solid: resistance R; dashed: reactance X, both in ohms at the antenna's feed point.${measuredFeed.length > 0 && measured ? ` Dotted: R (light) and X (dark) of ${measured.label}${measured.views.measuredAt === "radio-end" ? ", estimated at the feed point through the feedline" : ""}.` : ""} Resonance is where X crosses zero.`}
      table={
        <table className={tableClass} aria-label={`Impedance against frequency, ${name}`}>
          <thead>
            <tr>
              <th scope="col">MHz</th>
              <th scope="col">R at the feed point (Ω)</th>
              <th scope="col">X at the feed point (Ω)</th>
              <th scope="col">R at the radio (Ω)</th>
              <th scope="col">X at the radio (Ω)</th>
            </tr>
          </thead>
          <tbody>
            {band.sweep.map((point) => (
              <tr key={point.mhz}>
                <th scope="row">{point.mhz.toFixed(4)}</th>
                <td>{point.feed.r.toFixed(1)}</td>
                <td>{point.feed.x.toFixed(1)}</td>
                <td>{point.radio.r.toFixed(1)}</td>
                <td>{point.radio.x.toFixed(1)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke="#cbd5e1" strokeDasharray="2 4" />
          <XAxis dataKey="mhz" type="number" domain={frequencyDomain(band, [measuredFeed])} allowDataOverflow tickFormatter={mhzTick} tickCount={6} unit=" MHz" fontSize={12} />
          <YAxis fontSize={12} width={48} unit=" Ω" />
          <ReferenceLine y={0} stroke={SLATE} />
          <ReferenceLine x={band.band.lowMHz} stroke={MID_SLATE} strokeDasharray="3 3" />
          <ReferenceLine x={band.band.highMHz} stroke={MID_SLATE} strokeDasharray="3 3" />
          <Tooltip formatter={(value) => `${Number(value).toFixed(1)} Ω`} labelFormatter={(mhz) => `${Number(mhz).toFixed(4)} MHz`} />
          <Legend />
          <Line type="monotone" dataKey="r" name="R" stroke={COPPER} strokeWidth={2.5} dot={false} isAnimationActive={false} />
          <Line type="monotone" dataKey="x" name="X" stroke={SLATE} strokeWidth={2.5} strokeDasharray="6 4" dot={false} isAnimationActive={false} />
          {measuredFeed.length > 0 && (
            <Line data={measuredFeed} type="linear" dataKey="r" name="R, measured" stroke={LIGHT_COPPER} strokeWidth={3} strokeDasharray="2 3" dot={false} isAnimationActive={false} />
          )}
          {measuredFeed.length > 0 && (
            <Line data={measuredFeed} type="linear" dataKey="x" name="X, measured" stroke={MID_SLATE} strokeWidth={3} strokeDasharray="2 3" dot={false} isAnimationActive={false} />
          )}
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

export function CurrentChart({ currents, band, units }: { currents: WireCurrent[]; band: PlanBand; units: Units }) {
  return (
    <ChartFigure
      title={`Current along the wires at ${band.centreMHz.toFixed(3)} MHz`}
      description={`RMS current in amperes at ${band.endVoltages.powerW} W, against the distance from each wire's start. Each wire has its own line pattern.`}
      table={
        <table className={tableClass} aria-label={`Current along the wires, ${band.band.name}`}>
          <thead>
            <tr>
              <th scope="col">Wire</th>
              <th scope="col">From its start</th>
              <th scope="col">RMS current (A)</th>
            </tr>
          </thead>
          <tbody>
            {currents.flatMap((wire) =>
              wire.points.map((point, index) => (
                <tr key={`${wire.wire}-${index}`}>
                  <th scope="row">{wire.label}</th>
                  <td>{formatDistance(point.distanceM, units)}</td>
                  <td>{point.rmsA.toFixed(3)}</td>
                </tr>
              )),
            )}
          </tbody>
        </table>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke="#cbd5e1" strokeDasharray="2 4" />
          <XAxis dataKey="distanceM" type="number" domain={[0, "dataMax"]} fontSize={12} tickFormatter={(m: number) => formatDistance(m, units)} />
          <YAxis fontSize={12} width={48} unit=" A" />
          <Tooltip formatter={(value) => `${Number(value).toFixed(3)} A`} labelFormatter={(m) => `${formatDistance(Number(m), units)} from the start`} />
          <Legend />
          {currents.map((wire, index) => {
            const stroke = STROKES[index % STROKES.length];
            return (
              <Line
                key={wire.wire}
                data={wire.points}
                dataKey="rmsA"
                name={wire.label}
                stroke={stroke.colour}
                strokeDasharray={stroke.dash}
                strokeWidth={2}
                dot={false}
                isAnimationActive={false}
              />
            );
          })}
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
