import { Link } from "react-router";
import type { Route } from "./+types/index";
import { outboxIsAvailable } from "~/mail/outbox.server";

export const meta: Route.MetaFunction = () => [{ title: "Admin — Dryside" }];

export async function loader() {
  return { outbox: outboxIsAvailable() };
}

export default function AdminIndex({ loaderData }: Route.ComponentProps) {
  const links = [
    { to: "/admin/users", label: "Users and roles", text: "Find people, change roles, sign them out everywhere." },
    { to: "/admin/payments", label: "Payments", text: "Checkout sessions, entitlements and the webhook event log." },
    { to: "/admin/audit", label: "Audit log", text: "Role changes, sign-ins, publications: who did what and when." },
    ...(loaderData.outbox
      ? [
          {
            to: "/admin/outbox",
            label: "Mail outbox",
            text: "Mail caught by the local mail catcher (development only).",
          },
        ]
      : []),
  ];
  return (
    <section>
      <h1 className="text-3xl">Admin</h1>
      <ul className="mt-6 grid gap-4 sm:grid-cols-2">
        {links.map((link) => (
          <li key={link.to} className="rounded border border-rule bg-sheet p-4">
            <Link to={link.to} className="font-semibold">
              {link.label}
            </Link>
            <p className="mt-1 text-sm text-graphite-soft">{link.text}</p>
          </li>
        ))}
      </ul>
    </section>
  );
}
