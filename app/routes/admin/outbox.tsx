import { data } from "react-router";
import type { Route } from "./+types/outbox";
import { listCaughtMail, outboxIsAvailable } from "~/mail/outbox.server";

export const meta: Route.MetaFunction = () => [{ title: "Mail outbox — Dryside admin" }];

export async function loader() {
  if (!outboxIsAvailable()) throw data({ message: "The mail outbox exists only in development." }, { status: 404 });
  return { messages: await listCaughtMail() };
}

export default function AdminOutbox({ loaderData }: Route.ComponentProps) {
  return (
    <section>
      <h1 className="text-3xl">Mail outbox</h1>
      <p className="mt-2 text-sm text-graphite-soft">
        Mail caught by the local mail catcher, newest first. Nothing here left this machine.
      </p>
      {loaderData.messages.length === 0 && <p className="mt-6">No mail yet.</p>}
      <ul className="mt-6 flex flex-col gap-3">
        {loaderData.messages.map((message) => (
          <li key={message.id} className="rounded border border-rule bg-sheet p-4">
            <details>
              <summary className="cursor-pointer">
                <strong>{message.subject}</strong>{" "}
                <span className="text-sm text-graphite-soft">
                  to {message.to.join(", ")} · {message.date.replace("T", " ").slice(0, 19)}
                </span>
              </summary>
              <pre className="mt-3 whitespace-pre-wrap text-sm">{message.text}</pre>
            </details>
          </li>
        ))}
      </ul>
    </section>
  );
}
