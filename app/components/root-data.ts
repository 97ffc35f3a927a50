import { useRouteLoaderData } from "react-router";
import type { StaffRole } from "~/vocabulary/roles";

export interface RootData {
  user: { id: number; displayName: string; role: StaffRole } | null;
  csrfToken: string;
}

/** The root loader's data; undefined while the root itself is in error. */
export function useRootData(): RootData | undefined {
  return useRouteLoaderData("root") as RootData | undefined;
}

export function useOptionalUser(): RootData["user"] {
  return useRootData()?.user ?? null;
}
