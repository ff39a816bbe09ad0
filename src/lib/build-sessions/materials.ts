// What a build session needs, from its antenna plan: the materials per participant and for the
// whole session, and what each participant brings or borrows. Pure: the plan comes from the
// antenna engine (src/lib/antenna), the counts from the session.
//
// Allowances (all common practice, stated on the session page):
// - wrap allowance: already in the engine's cut sheet (about 15 cm per wire end, folded back
//   through the insulator or terminal);
// - spare wire: 10 % of the wire to cut, at least 1 m per participant, for a mis-cut and for
//   re-tying after trimming too far;
// - coax: the plan's feedline length plus 0.5 m for the plugs and strain relief at both ends,
//   rounded up to a whole metre;
// - support cord: the antenna's height plus 5 m per tie-off, to reach a stake or a tree with
//   slack to adjust.
import type { PlanResult } from "@/lib/antenna";

export const SPARE_WIRE_FRACTION = 0.1;
export const SPARE_WIRE_MIN_M = 1;
export const COAX_END_ALLOWANCE_M = 0.5;
export const CORD_EXTRA_M = 5;

export const allowanceNotes = [
  "Cut lengths include the wrap allowance of the cut sheet (about 15 cm per wire end).",
  `Spare wire: ${SPARE_WIRE_FRACTION * 100} % of the wire to cut, at least ${SPARE_WIRE_MIN_M} m per participant, for a mis-cut or a re-tie after trimming (common practice).`,
  `Coax: the plan's feedline length plus ${COAX_END_ALLOWANCE_M} m for the plugs and strain relief, rounded up to a whole metre (common practice).`,
  `Support cord: the antenna's height plus ${CORD_EXTRA_M} m per tie-off (common practice).`,
];

export type PlanForMaterials = Pick<PlanResult, "family" | "cutSheet" | "transformer" | "feedline" | "request">;

export interface MaterialLine {
  item: string;
  unit: "m" | "pcs";
  perParticipant: number;
  total: number;
  note?: string;
}

export interface KitItem {
  item: string;
  /** "borrow" items are on the club's lending desk. */
  source: "bring" | "borrow";
  note?: string;
}

export interface Materials {
  participants: number;
  lines: MaterialLine[];
  kit: KitItem[];
  allowances: string[];
}

/** Rounded up to the tenth of a metre, the precision a roll of wire is cut to. */
const upToTenth = (metres: number) => Math.ceil(metres * 10 - 1e-9) / 10;

export function wirePerParticipantM(plan: PlanForMaterials): number {
  const cut = plan.cutSheet.totalWireM;
  return upToTenth(cut + Math.max(SPARE_WIRE_MIN_M, SPARE_WIRE_FRACTION * cut));
}

export function coaxLengthM(plan: PlanForMaterials): number {
  return Math.ceil(plan.feedline.lengthM + COAX_END_ALLOWANCE_M);
}

/** Every piece of the cut sheet is joined at the feed point (balun, unun or radial hub). */
function piecesAtFeed(plan: PlanForMaterials): number {
  return plan.cutSheet.lines.reduce((sum, line) => sum + line.count, 0);
}

/** The far end of each piece hangs from an insulator, except an end-fed's counterpoise, which lies free. */
function endInsulators(plan: PlanForMaterials): number {
  return plan.family === "end-fed" ? 1 : piecesAtFeed(plan);
}

export function materialsFor(plan: PlanForMaterials, participants: number, options: { raisesMast: boolean }): Materials {
  const perHead = (item: string, unit: MaterialLine["unit"], perParticipant: number, note?: string): MaterialLine => ({
    item,
    unit,
    perParticipant,
    total: unit === "m" ? upToTenth(perParticipant * participants) : perParticipant * participants,
    ...(note ? { note } : {}),
  });
  const insulators = endInsulators(plan);
  const cordM = upToTenth(plan.request.heightM + CORD_EXTRA_M);
  const joints = piecesAtFeed(plan);
  const transformerNote = plan.transformer.kind === "balun" ? "with eyes for the wire ends; it doubles as the centre insulator" : "at the feed end, with a terminal for the radiator";

  const lines: MaterialLine[] = [
    perHead("Antenna wire", "m", wirePerParticipantM(plan), `${plan.cutSheet.totalWireM} m to cut, plus spare`),
    perHead("End insulators", "pcs", insulators),
    ...(plan.request.family === "fan-dipole" ? [perHead("Spreaders to keep the elements apart", "pcs", 4, "two along each side")] : []),
    perHead("Support cord (non-conducting, UV-stable)", "m", upToTenth(insulators * cordM), `${insulators} × ${cordM} m`),
    perHead(plan.transformer.label, "pcs", 1, transformerNote),
    perHead(`Coax, ${plan.feedline.label}`, "m", coaxLengthM(plan), "or a coax run of at least this length from the lending desk"),
    perHead("Coax plugs to suit the balun or unun and the radio", "pcs", 2),
    perHead("Ring terminals for the wire ends at the feed point", "pcs", joints),
    perHead("Heat-shrink sleeves for the terminals", "pcs", joints),
    perHead("Self-amalgamating tape for the coax joints", "m", 1),
  ];

  const kit: KitItem[] = [
    { item: "Wire cutters and strippers", source: "bring" },
    { item: "A steel tape measure in metres, 5 m or longer", source: "bring" },
    { item: "Eye protection", source: "bring" },
    { item: "A marker to label the wires as you cut them", source: "bring" },
    { item: "An antenna analyser", source: "borrow", note: "a newcomer's analyser loan needs a mentor's co-sign" },
    { item: `A coax run (${plan.feedline.label}), at least ${coaxLengthM(plan)} m`, source: "borrow" },
    { item: `A ${plan.transformer.label}`, source: "borrow", note: "or build one at the session" },
    ...(options.raisesMast ? [{ item: "A portable mast with its guy kit", source: "borrow" as const }] : []),
  ];

  return { participants, lines, kit, allowances: allowanceNotes };
}

/** One line per kit item, for messages: "Wire cutters and strippers (bring)". */
export function kitLines(kit: readonly KitItem[]): string[] {
  return kit.map((entry) => `${entry.item} (${entry.source === "borrow" ? "borrow from the lending desk" : "bring"})`);
}
