import type { Route } from "./+types/audit";
import { listAuditEvents } from "~/auth/audit.server";

export const meta: Route.MetaFunction = () => [{ title: "Audit log — Dryside admin" }];

export async function loader() {
  return { events: await listAuditEvents({ limit: 200 }) };
}

export default function AdminAudit({ loaderData }: Route.ComponentProps) {
  return (
    <section>
      <h1 className="text-3xl">Audit log</h1>
      <p className="mt-2 text-sm text-graphite-soft">The latest 200 events, newest first.</p>
      <table className="mt-6 w-full text-left text-sm">
        <thead>
          <tr className="border-b border-rule">
            <th className="py-2">When (UTC)</th>
            <th>Who</th>
            <th>What</th>
            <th>Subject</th>
            <th>Details</th>
          </tr>
        </thead>
        <tbody>
          {loaderData.events.map((event) => (
            <tr key={event.id} className="border-b border-rule/60">
              <td className="py-2 font-mono text-xs">{event.at.replace("T", " ").slice(0, 19)}</td>
              <td>{event.actor ?? "—"}</td>
              <td>{event.action}</td>
              <td>{event.subject}</td>
              <td className="font-mono text-xs">{event.details ? JSON.stringify(event.details) : ""}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
