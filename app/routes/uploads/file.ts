import { Readable } from "node:stream";
import { data } from "react-router";
import type { Route } from "./+types/file";
import { getViewer } from "~/access/viewer.server";
import { readUpload } from "~/desk/uploads.server";

// GET /uploads/:id — a revision's drawing or photo, only for those who may read it (see readUpload).
export async function loader({ params, context }: Route.LoaderArgs) {
  const file = await readUpload(getViewer(context), Number(params.id) || 0);
  if (file === null) throw data({ message: "No file is filed under that address." }, { status: 404 });
  const safeName = file.name.replace(/[^A-Za-z0-9._ -]/g, "_");
  return new Response(Readable.toWeb(file.body) as ReadableStream, {
    headers: {
      "Content-Type": file.contentType,
      "Content-Length": String(file.size),
      "Content-Disposition": `inline; filename="${safeName}"`,
      // The type was read from the bytes; the browser must not guess another, and an SVG opened on its
      // own must not run anything even if sanitising missed something.
      "X-Content-Type-Options": "nosniff",
      "Content-Security-Policy": "default-src 'none'; style-src 'unsafe-inline'; img-src data:; sandbox",
      "Cache-Control": "private, max-age=300",
    },
  });
}
