import { materialLibrary } from "~/catalogue/materials.server";
import { DetailSet } from "~/models/index.server";

/** The choices the detail form offers: the material library and the sets. */
export async function editorChoices(): Promise<{
  materials: { slug: string; name: string; family: string }[];
  sets: { slug: string; title: string }[];
}> {
  const [library, sets] = await Promise.all([
    materialLibrary(),
    DetailSet.findAll({ attributes: ["slug", "title"], order: [["title", "ASC"]] }),
  ]);
  const materials = [...library.values()]
    .map((m) => ({ slug: m.slug, name: m.name, family: m.family }))
    .sort((a, b) => a.name.localeCompare(b.name));
  return { materials, sets: sets.map((set) => ({ slug: set.slug, title: set.title })) };
}
