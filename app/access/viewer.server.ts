import type { RouterContextProvider } from "react-router";
import { getUser } from "~/auth/guards.server";
import type { Viewer } from "./premium.server";

/** The signed-in person as the access rules need them, or null for a visitor (loaded once by the root middleware). */
export function getViewer(context: Readonly<RouterContextProvider>): Viewer | null {
  const user = getUser(context);
  return user ? { id: user.id, role: user.role } : null;
}
