import { materialLibrary } from "~/catalogue/materials.server";

// GET /api/materials — the material library with every value's source.
export async function loader() {
  const library = await materialLibrary();
  return Response.json({ materials: [...library.values()] }, { headers: { "Cache-Control": "public, max-age=60" } });
}
