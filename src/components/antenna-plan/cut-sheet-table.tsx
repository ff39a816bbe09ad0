// The cut sheet as a table, in the person's units; the plan screen and the printed station
// sheet both show it (no hooks, so it renders on the server too).
import type { CutSheet } from "@/lib/antenna/cut-sheet";
import { formatCutLength, type Units } from "@/lib/plan-screen/format";
import { tableClass } from "./table-class";

export function CutSheetTable({ cutSheet, units, caption = "Cut sheet" }: { cutSheet: CutSheet; units: Units; caption?: string }) {
  return (
    <table className={tableClass}>
      <caption>{caption}</caption>
      <thead>
        <tr>
          <th scope="col">Piece</th>
          <th scope="col">Count</th>
          <th scope="col">Cut each to</th>
          <th scope="col">Electrical length</th>
          <th scope="col">Wrap per end</th>
          <th scope="col">Rule of thumb</th>
        </tr>
      </thead>
      <tbody>
        {cutSheet.lines.map((line) => (
          <tr key={line.label}>
            <th scope="row">{line.label}</th>
            <td>{line.count}</td>
            <td className="font-bold">{formatCutLength(line.cutLengthM, units)}</td>
            <td>{formatCutLength(line.electricalLengthM, units)}</td>
            <td>{formatCutLength(line.wrapPerEndM, units)}</td>
            <td>{line.ruleOfThumbM === undefined ? "—" : formatCutLength(line.ruleOfThumbM, units)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr>
          <th scope="row" colSpan={2}>
            Wire in all
          </th>
          <td colSpan={4}>{formatCutLength(cutSheet.totalWireM, units)}</td>
        </tr>
      </tfoot>
    </table>
  );
}
