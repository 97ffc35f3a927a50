import { Outlet } from "react-router";
import type { Route } from "./+types/layout";
import { guardArea } from "~/auth/guards.server";

// Every admin route sits under this layout: signed in and at least admin, checked once before any loader or action.
export const middleware: Route.MiddlewareFunction[] = [guardArea("admin")];

export default function AdminLayout() {
  return <Outlet />;
}
