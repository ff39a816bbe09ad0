// Sites: reusable places with a size, a ground class and marked hazards.
import { asc, eq } from "drizzle-orm";
import { db } from "@/server/db";
import { sites, type SiteRow } from "@/server/db/schema";
import { badInput, forbidden, notFound, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, type Actor } from "@/server/policy";
import type { SiteInput } from "@/validations/antenna-days";

export interface SiteDto {
  id: string;
  name: string;
  widthM: number;
  depthM: number;
  groundClass: SiteRow["groundClass"];
  groundConductivitySm: number | null;
  groundRelativePermittivity: number | null;
  notes: string;
  hazards: SiteRow["hazards"];
  updatedAt: string;
}

export function toSiteDto(row: SiteRow): SiteDto {
  return {
    id: row.id,
    name: row.name,
    widthM: row.widthM,
    depthM: row.depthM,
    groundClass: row.groundClass,
    groundConductivitySm: row.groundConductivitySm,
    groundRelativePermittivity: row.groundRelativePermittivity,
    notes: row.notes,
    hazards: row.hazards,
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function listSites(actor: Actor): Promise<SiteDto[]> {
  if (!can(actor, "antennaDays.view")) throw forbidden();
  const rows = await db().select().from(sites).orderBy(asc(sites.name));
  return rows.map(toSiteDto);
}

export async function getSite(actor: Actor, id: string): Promise<SiteDto> {
  if (!can(actor, "antennaDays.view")) throw forbidden();
  const row = await db().query.sites.findFirst({ where: eq(sites.id, id) });
  if (!row) throw notFound("That site");
  return toSiteDto(row);
}

function groundColumns(input: SiteInput) {
  const custom = input.groundClass === "custom";
  return {
    groundClass: input.groundClass,
    groundConductivitySm: custom ? input.groundConductivitySm : null,
    groundRelativePermittivity: custom ? input.groundRelativePermittivity : null,
  };
}

async function writeSite<T>(write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (pgErrorCode(error) === pgErrorCodes.uniqueViolation) throw badInput("name", "Another site already has this name.");
    throw error;
  }
}

export async function createSite(actor: Actor, input: SiteInput): Promise<SiteDto> {
  if (!can(actor, "antennaDays.manage")) throw forbidden();
  const [row] = await writeSite(() =>
    db()
      .insert(sites)
      .values({ name: input.name, widthM: input.widthM, depthM: input.depthM, ...groundColumns(input), notes: input.notes, hazards: input.hazards })
      .returning(),
  );
  return toSiteDto(row);
}

export async function updateSite(actor: Actor, id: string, input: SiteInput): Promise<SiteDto> {
  if (!can(actor, "antennaDays.manage")) throw forbidden();
  const [row] = await writeSite(() =>
    db()
      .update(sites)
      .set({ name: input.name, widthM: input.widthM, depthM: input.depthM, ...groundColumns(input), notes: input.notes, hazards: input.hazards, updatedAt: new Date() })
      .where(eq(sites.id, id))
      .returning(),
  );
  if (!row) throw notFound("That site");
  return toSiteDto(row);
}
