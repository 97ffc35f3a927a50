import { buildMaterialLibrary, type Material } from "~/envelope";
import { MaterialRecord } from "~/models/index.server";

// The library is small and read on every site check; a short-lived per-process copy saves a query
// per check while edits still show within seconds on every app server.
const TTL_MS = 10_000;
let cache: { at: number; library: ReadonlyMap<string, Material> } | undefined;

export async function materialLibrary(): Promise<ReadonlyMap<string, Material>> {
  if (cache && Date.now() - cache.at < TTL_MS) return cache.library;
  const rows = await MaterialRecord.findAll({ attributes: ["properties"], order: [["slug", "ASC"]] });
  const library = buildMaterialLibrary(rows.map((row) => row.properties));
  cache = { at: Date.now(), library };
  return library;
}

export function forgetMaterialLibrary(): void {
  cache = undefined;
}
