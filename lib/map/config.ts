import "server-only";
import { env } from "@/lib/env";

/** Tile server settings handed to the map component by server pages. */
export function tileConfig() {
  return { tileUrl: env().TILE_URL, attribution: env().TILE_ATTRIBUTION };
}
