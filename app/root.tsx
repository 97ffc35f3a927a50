import { Links, Meta, Outlet, Scripts, ScrollRestoration } from "react-router";
import type { Route } from "./+types/root";
import { AppShell } from "~/components/app-shell";
import { ErrorPage } from "~/components/error-page";
import { loadUser } from "~/auth/guards.server";
import { loadRootData } from "~/auth/root-data.server";
import "./app.css";

export const middleware: Route.MiddlewareFunction[] = [
  // Outermost, so an outage anywhere below (the session lookup included) becomes a 503.
  async ({ request }, next) => {
    const response = await next();
    if (!(response instanceof Response) || response.status < 500) return response;
    // Imported lazily so the client bundle never sees the database module.
    const { replaceWithUnavailableIfDatabaseDown } = await import("~/db/availability.server");
    return replaceWithUnavailableIfDatabaseDown(request, response);
  },
  // The visitor's account, looked up once per request for the root loader, the area guards and every page.
  loadUser,
];

// The signed-in user's public fields (or null) and the CSRF token, for the shell and every form.
export async function loader({ request, context }: Route.LoaderArgs) {
  return loadRootData(request, context);
}

export const links: Route.LinksFunction = () => [{ rel: "icon", href: "/favicon.svg", type: "image/svg+xml" }];

export function Layout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <Meta />
        <Links />
      </head>
      <body className="min-h-screen">
        {children}
        <ScrollRestoration />
        <Scripts />
      </body>
    </html>
  );
}

export default function App() {
  return (
    <AppShell>
      <Outlet />
    </AppShell>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return (
    <AppShell>
      <ErrorPage error={error} />
    </AppShell>
  );
}
