import { Outlet } from "react-router";
import type { Route } from "./+types/layout";
import { guardArea } from "~/auth/guards.server";

// Every account route sits under this layout: signed in and at least member, checked once before any loader or action.
export const middleware: Route.MiddlewareFunction[] = [guardArea("member")];

export default function AccountLayout() {
  return <Outlet />;
}
