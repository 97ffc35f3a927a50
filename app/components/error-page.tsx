import { isRouteErrorResponse, Link } from "react-router";

function describe(error: unknown): { status: number; title: string; message: string } {
  if (isRouteErrorResponse(error)) {
    const message = typeof error.data === "string" ? error.data : (error.data?.message ?? error.statusText);
    const titles: Record<number, string> = {
      400: "That request did not make sense",
      401: "Please sign in",
      403: "This needs a different kind of access",
      404: "Nothing is filed under that address",
      503: "The library is briefly unavailable",
    };
    return { status: error.status, title: titles[error.status] ?? "Something went wrong", message };
  }
  return {
    status: 500,
    title: "Something went wrong on our side",
    message: "The error has been logged. Try again in a moment.",
  };
}

/** The one error view every route's boundary renders. */
export function ErrorPage({ error }: { error: unknown }) {
  const { status, title, message } = describe(error);
  return (
    <section className="mx-auto max-w-2xl py-16">
      <p className="font-mono text-sm text-graphite-soft">Error {status}</p>
      <h1 className="mt-2 text-3xl">{title}</h1>
      <p className="mt-4 text-graphite-soft">{message}</p>
      <p className="mt-8">
        <Link to="/details">Back to the catalogue</Link>
      </p>
    </section>
  );
}
