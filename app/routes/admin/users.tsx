import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import type { ReactNode } from "react";
import { Form, data, useSearchParams } from "react-router";
import type { Route } from "./+types/users";
import { requireCsrf } from "~/auth/csrf.server";
import { userContext } from "~/auth/guards.server";
import { STAFF_ROLES, STAFF_ROLE_LABELS } from "~/vocabulary/roles";
import { userAdminSchema } from "~/auth/schemas";
import { UserAdminError, changeRole, listUsers, revokeSessionsByAdmin } from "~/auth/user-admin.server";
import { CsrfField } from "~/components/csrf-field";

export const meta: Route.MetaFunction = () => [{ title: "Users — Dryside admin" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const admin = context.get(userContext);
  const q = new URL(request.url).searchParams.get("q") ?? "";
  return { users: await listUsers({ q }), selfId: admin.id };
}

export async function action({ request, context }: Route.ActionArgs) {
  const admin = context.get(userContext);
  const formData = await requireCsrf(request);
  const submission = parseWithZod(formData, { schema: userAdminSchema });
  if (submission.status !== "success") return data({ message: "That change was not understood." }, { status: 400 });
  const change = submission.value;
  try {
    if (change.intent === "change-role") {
      await changeRole(admin.id, change.userId, change.role);
      return { message: `Role changed to ${change.role}; that person signs in again to use it.` };
    }
    const count = await revokeSessionsByAdmin(admin.id, change.userId);
    return { message: `Signed out of ${count} browser${count === 1 ? "" : "s"}.` };
  } catch (error) {
    if (error instanceof UserAdminError) return data({ message: error.message }, { status: 400 });
    throw error;
  }
}

/** One change to one account (its hidden fields say which), checked with the action's schema before it is sent. */
function UserAdminForm({ className, children }: { className?: string; children: ReactNode }) {
  const [form] = useForm({ onValidate: ({ formData }) => parseWithZod(formData, { schema: userAdminSchema }) });
  return (
    <Form method="post" {...getFormProps(form)} className={className}>
      <CsrfField />
      {children}
    </Form>
  );
}

export default function AdminUsers({ loaderData, actionData }: Route.ComponentProps) {
  const [searchParams] = useSearchParams();
  return (
    <section>
      <h1 className="text-3xl">Users and roles</h1>
      <Form method="get" role="search" className="mt-4 flex max-w-md gap-2">
        <label htmlFor="user-q" className="sr-only">
          Search by name or e-mail
        </label>
        <input
          id="user-q"
          name="q"
          defaultValue={searchParams.get("q") ?? ""}
          placeholder="Name or e-mail"
          className="flex-1 rounded border border-rule bg-sheet px-3 py-2"
        />
        <button type="submit" className="rounded border border-rule px-3 py-2">
          Search
        </button>
      </Form>
      {actionData?.message && (
        <p role="status" className="mt-4 text-sm">
          {actionData.message}
        </p>
      )}
      <table className="mt-6 w-full text-left text-sm">
        <thead>
          <tr className="border-b border-rule">
            <th className="py-2">Name</th>
            <th>E-mail</th>
            <th>Confirmed</th>
            <th>Browsers</th>
            <th>Role</th>
            <th>
              <span className="sr-only">Sessions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {loaderData.users.map((user) => (
            <tr key={user.id} className="border-b border-rule/60 align-middle" data-testid={`user-${user.id}`}>
              <td className="py-2">{user.displayName}</td>
              <td>{user.email}</td>
              <td>{user.verified ? "yes" : "no"}</td>
              <td>{user.liveSessions}</td>
              <td>
                {user.id === loaderData.selfId ? (
                  user.role
                ) : (
                  <UserAdminForm className="flex gap-2">
                    <input type="hidden" name="intent" value="change-role" />
                    <input type="hidden" name="userId" value={user.id} />
                    <label className="sr-only" htmlFor={`role-${user.id}`}>
                      Role of {user.displayName}
                    </label>
                    <select
                      id={`role-${user.id}`}
                      name="role"
                      defaultValue={user.role}
                      className="rounded border border-rule bg-sheet px-2 py-1"
                    >
                      {STAFF_ROLES.map((role) => (
                        <option key={role} value={role}>
                          {STAFF_ROLE_LABELS[role]}
                        </option>
                      ))}
                    </select>
                    <button type="submit" className="rounded border border-rule px-2 py-1">
                      Change
                    </button>
                  </UserAdminForm>
                )}
              </td>
              <td>
                <UserAdminForm>
                  <input type="hidden" name="intent" value="revoke-sessions" />
                  <input type="hidden" name="userId" value={user.id} />
                  <button
                    type="submit"
                    className="text-stop underline-offset-2 hover:underline"
                    disabled={user.liveSessions === 0}
                  >
                    Sign out everywhere
                  </button>
                </UserAdminForm>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
