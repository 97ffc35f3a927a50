import { Outlet } from "react-router";
import type { Route } from "./+types/layout";
import { guardArea } from "~/auth/guards.server";

// Every desk route sits under this layout: signed in and at least editor, checked once before any loader or action.
export const middleware: Route.MiddlewareFunction[] = [guardArea("editor")];

export default function DeskLayout() {
  return <Outlet />;
}
