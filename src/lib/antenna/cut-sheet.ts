/**
 * The cut sheet: every wire to cut, with the extra wire that wraps back at the
 * insulators. Lengths in metres and in feet and inches to the nearest 1/8 in.
 */

const METRES_PER_INCH = 0.0254;

/**
 * Wrap allowance per wire end, common practice: about 15 cm of wire folds back
 * through an insulator's eye (or under a terminal) and twists onto itself. That
 * wire carries no current along the antenna, so it is cut extra; trimming later
 * moves the fold instead of splicing. Short VHF elements get 5 % of the wire
 * instead, so the fold never dwarfs the element.
 */
export const WRAP_ALLOWANCE_PER_END_M = 0.15;
export const WRAP_ALLOWANCE_MAX_FRACTION = 0.05;

export const WRAP_ALLOWANCE_NOTE =
  "Each end gets about 15 cm extra (5 % of the wire for short elements) to fold back through the insulator or terminal and twist onto itself (common practice). Measure the electrical length from the insulator's eye, not from the tip of the twisted wire.";

export interface CutPiece {
  /** What the piece is: "Left leg", "Radial", "40m element, each leg". */
  label: string;
  /** How many identical pieces to cut. */
  count: number;
  /** Length that carries current, insulator eye to insulator eye. */
  electricalLengthM: number;
  /** The rule-of-thumb length for the same piece, when the trade has one. */
  ruleOfThumbM?: number;
}

export interface CutSheetLine {
  label: string;
  count: number;
  electricalLengthM: number;
  electricalLength: string;
  wrapPerEndM: number;
  cutLengthM: number;
  cutLength: string;
  ruleOfThumbM?: number;
}

export interface CutSheet {
  lines: CutSheetLine[];
  totalWireM: number;
  wrapNote: string;
}

export function wrapAllowanceM(electricalLengthM: number): number {
  return Math.min(WRAP_ALLOWANCE_PER_END_M, WRAP_ALLOWANCE_MAX_FRACTION * electricalLengthM);
}

/** "33 ft 4 1/2 in": feet, inches and eighths, the fraction in lowest terms. */
export function feetAndInches(metres: number): string {
  const eighths = Math.round((metres / METRES_PER_INCH) * 8);
  const feet = Math.floor(eighths / 96);
  const wholeInches = Math.floor((eighths % 96) / 8);
  let numerator = eighths % 8;
  let denominator = 8;
  while (numerator > 0 && numerator % 2 === 0) {
    numerator /= 2;
    denominator /= 2;
  }
  const fraction = numerator === 0 ? "" : `${numerator}/${denominator}`;
  const inches = [wholeInches > 0 || !fraction ? String(wholeInches) : "", fraction].filter(Boolean).join(" ");
  return feet > 0 ? `${feet} ft ${inches} in` : `${inches} in`;
}

/** Round to the millimetre, the precision a tape measure gives. */
function toMillimetre(metres: number): number {
  return Math.round(metres * 1000) / 1000;
}

export function cutSheet(pieces: CutPiece[]): CutSheet {
  const lines = pieces.map((piece): CutSheetLine => {
    const wrapPerEndM = toMillimetre(wrapAllowanceM(piece.electricalLengthM));
    const cutLengthM = toMillimetre(piece.electricalLengthM + 2 * wrapPerEndM);
    const electricalLengthM = toMillimetre(piece.electricalLengthM);
    return {
      label: piece.label,
      count: piece.count,
      electricalLengthM,
      electricalLength: feetAndInches(electricalLengthM),
      wrapPerEndM,
      cutLengthM,
      cutLength: feetAndInches(cutLengthM),
      ...(piece.ruleOfThumbM === undefined ? {} : { ruleOfThumbM: toMillimetre(piece.ruleOfThumbM) }),
    };
  });
  const totalWireM = toMillimetre(lines.reduce((sum, line) => sum + line.count * line.cutLengthM, 0));
  return { lines, totalWireM, wrapNote: WRAP_ALLOWANCE_NOTE };
}
