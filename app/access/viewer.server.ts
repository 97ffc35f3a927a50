import { getUser } from "~/auth/guards.server";
import type { Viewer } from "./premium.server";

/** The signed-in person as the access rules need them, or null for a visitor. */
export async function getViewer(request: Request): Promise<Viewer | null> {
  const user = await getUser(request);
  return user ? { id: user.id, role: user.role } : null;
}
