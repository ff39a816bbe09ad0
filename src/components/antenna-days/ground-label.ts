import { GROUND_CLASSES } from "@/lib/antenna/ground-classes";

/** "Average" or "custom, σ 0.01 S/m, εr 30". */
export function groundLabel(site: { groundClass: string; groundConductivitySm: number | null; groundRelativePermittivity: number | null }): string {
  if (site.groundClass === "custom") return `custom ground, σ ${site.groundConductivitySm} S/m, εr ${site.groundRelativePermittivity}`;
  return `${GROUND_CLASSES.find((ground) => ground.id === site.groundClass)?.label ?? site.groundClass} ground`;
}
