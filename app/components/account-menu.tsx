import { Form, Link, NavLink } from "react-router";
import { roleAtLeast } from "~/vocabulary/roles";
import { CsrfField } from "./csrf-field";
import { useOptionalUser } from "./root-data";

const linkClass = ({ isActive }: { isActive: boolean }) =>
  `no-underline ${isActive ? "text-graphite font-semibold border-b-2 border-ochre" : "text-graphite-soft hover:text-graphite"}`;

/** Sign-in link for visitors; the account, Desk and Admin links and sign-out for signed-in people. */
export function AccountMenu() {
  const user = useOptionalUser();
  if (!user) {
    return (
      <div className="ml-auto flex items-center gap-4 text-sm">
        <Link to="/sign-in" className="no-underline text-graphite-soft hover:text-graphite">
          Sign in
        </Link>
        <Link
          to="/sign-up"
          className="rounded border border-ochre px-3 py-1 no-underline text-ochre-deep hover:bg-ochre hover:text-white"
        >
          Create account
        </Link>
      </div>
    );
  }
  return (
    <nav aria-label="Account" className="ml-auto flex flex-wrap items-center gap-4 text-sm">
      {roleAtLeast(user.role, "editor") && (
        <NavLink to="/desk" className={linkClass}>
          Desk
        </NavLink>
      )}
      {user.role === "admin" && (
        <NavLink to="/admin" className={linkClass}>
          Admin
        </NavLink>
      )}
      <NavLink to="/account" className={linkClass} data-testid="account-link">
        {user.displayName}
      </NavLink>
      <Form method="post" action="/sign-out">
        <CsrfField />
        <button type="submit" className="text-graphite-soft underline-offset-2 hover:text-graphite hover:underline">
          Sign out
        </button>
      </Form>
    </nav>
  );
}
