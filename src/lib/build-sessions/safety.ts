// The safety notes of a build session: shown on the session page and in the messages that
// give someone a place. Cautions of the trade (common practice); local codes, the site's rules
// and licensed practice prevail over them.
import { FALL_ZONE_MIN_MARGIN_M } from "@/lib/site-plan/footprint";

export interface SafetySection {
  title: string;
  items: string[];
}

export const localCodesPrevail = "Local codes, the venue's rules and licensed practice prevail over these notes; ask your mentor when unsure.";

export function buildSessionSafety(options: { raisesMast: boolean }): SafetySection[] {
  const sections: SafetySection[] = [
    {
      title: "Soldering",
      items: [
        "A soldering iron tip runs at about 350 °C: keep it in its stand, never hand it over hot, and never catch a falling iron.",
        "Solder where the air moves and keep your face out of the flux fumes.",
        "Wash your hands after handling solder, before eating or drinking.",
      ],
    },
    {
      title: "Cutting and stripping",
      items: [
        "Wear eye protection when cutting wire: clipped ends fly.",
        "Cut and strip away from your body and your fingers; stranded copper ends are sharp.",
        "Measure twice and cut once: trimming later is easy, adding wire back is not.",
      ],
    },
    {
      title: "Testing: RF voltage at the wire ends",
      items: [
        "The ends of a wire antenna carry a high RF voltage even at modest power: keep them out of reach and insulated.",
        "Tune with an antenna analyser or the lowest power that gives a reading, and say out loud before you transmit.",
        "Nobody touches the antenna, the feed point or the coax connectors while a transmitter is keyed.",
      ],
    },
  ];
  if (options.raisesMast) {
    sections.push({
      title: "Raising a mast: working at height",
      items: [
        `Masts near power lines kill: put the mast where nothing can reach an overhead line if it falls or a wire slips, farther than the mast's height plus the longest wire, and never less than its height plus ${FALL_ZONE_MIN_MARGIN_M} m.`,
        "Raise it with a crew of at least two, a tag line and hard hats, and stay out of the fall zone while it goes up.",
        "Never raise a mast in strong wind or when thunder is about; flag the guy lines at head height.",
      ],
    });
  }
  return sections;
}
