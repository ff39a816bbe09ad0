// Short readable descriptions of items and bookings, shared by the shelf, the item page and labels.
import { cableTypeLabels, coaxConnectorLabels, type CoaxConnector } from "@/lib/gear/kinds";
import type { FeedlineTypeId } from "@/lib/antenna/feedline-types";

interface DetailFields {
  kind: string;
  minMhz: number | null;
  maxMhz: number | null;
  cableType: string | null;
  lengthM: number | null;
  connectorA: string | null;
  connectorB: string | null;
  heightM: number | null;
  guyKit: string | null;
  transformerStyle: string | null;
  transformerRatio: string | null;
  powerRatingW: number | null;
}

/** "RG-213, 20 m, PL-259 to N" and the like; empty for kinds without details. */
export function detailSummary(item: DetailFields): string {
  switch (item.kind) {
    case "analyser":
      return `${item.minMhz}–${item.maxMhz} MHz`;
    case "coax":
      return `${cableTypeLabels[item.cableType as FeedlineTypeId]}, ${item.lengthM} m, ${coaxConnectorLabels[item.connectorA as CoaxConnector]} to ${coaxConnectorLabels[item.connectorB as CoaxConnector]}`;
    case "mast":
      return `${item.heightM} m, guys: ${item.guyKit}`;
    case "balun":
      return `${item.transformerRatio} ${item.transformerStyle}, ${item.powerRatingW} W`;
    default:
      return "";
  }
}
