// Readable "what changed" lines between two revisions' front matter, for the revision history.

interface LayerLike {
  role: string;
  material: string;
  thickness_mm: number;
  framing?: { material: string; fraction: number };
}

export interface RevisionShape {
  title?: string;
  summary?: string;
  zones?: string[];
  tier?: string;
  layers?: LayerLike[];
  references?: string[];
}

function layerKey(layer: LayerLike): string {
  return `${layer.role}:${layer.material}`;
}

export function describeChanges(
  before: RevisionShape,
  after: RevisionShape,
  bodyBefore = "",
  bodyAfter = "",
): string[] {
  const changes: string[] = [];
  if (before.title !== after.title) changes.push(`Title changed to “${after.title}”.`);
  if (before.summary !== after.summary) changes.push("Summary rewritten.");
  const zonesBefore = new Set(before.zones ?? []);
  const zonesAfter = new Set(after.zones ?? []);
  const addedZones = [...zonesAfter].filter((z) => !zonesBefore.has(z));
  const removedZones = [...zonesBefore].filter((z) => !zonesAfter.has(z));
  if (addedZones.length)
    changes.push(`Now written for zone${addedZones.length > 1 ? "s" : ""} ${addedZones.join(", ")}.`);
  if (removedZones.length)
    changes.push(`No longer claimed for zone${removedZones.length > 1 ? "s" : ""} ${removedZones.join(", ")}.`);
  if (before.tier !== after.tier && after.tier) changes.push(`Access changed to ${after.tier}.`);

  const layersBefore = before.layers ?? [];
  const layersAfter = after.layers ?? [];
  const beforeByKey = new Map(layersBefore.map((layer) => [layerKey(layer), layer]));
  const afterKeys = new Set(layersAfter.map(layerKey));
  for (const layer of layersAfter) {
    const previous = beforeByKey.get(layerKey(layer));
    if (!previous) changes.push(`Added layer: ${layer.material} (${layer.role}), ${layer.thickness_mm} mm.`);
    else if (previous.thickness_mm !== layer.thickness_mm)
      changes.push(`${layer.material}: ${previous.thickness_mm} mm → ${layer.thickness_mm} mm.`);
    else if (previous.framing?.fraction !== layer.framing?.fraction)
      changes.push(
        `${layer.material}: framing fraction ${previous.framing?.fraction ?? "none"} → ${layer.framing?.fraction ?? "none"}.`,
      );
  }
  for (const layer of layersBefore)
    if (!afterKeys.has(layerKey(layer))) changes.push(`Removed layer: ${layer.material} (${layer.role}).`);
  const orderBefore = layersBefore.map(layerKey).filter((k) => afterKeys.has(k));
  const orderAfter = layersAfter.map(layerKey).filter((k) => beforeByKey.has(k));
  if (orderBefore.join("|") !== orderAfter.join("|")) changes.push("Layer order changed.");

  const refsBefore = new Set(before.references ?? []);
  for (const ref of after.references ?? []) if (!refsBefore.has(ref)) changes.push(`Reference added: ${ref}.`);
  if (bodyBefore && bodyAfter && bodyBefore !== bodyAfter) changes.push("Text revised.");
  return changes;
}
