import { Authenticator } from "remix-auth";
import { FormStrategy } from "remix-auth-form";
import type { User } from "~/models/index.server";
import { signInWithPassword } from "./accounts.server";
import { clientAddress } from "./rate-limit.server";

// remix-auth 4 only answers "who is this?"; the app starts and ends sessions itself (session.server.ts).
export const authenticator = new Authenticator<User>();

authenticator.use(
  new FormStrategy(async ({ form, request }) =>
    signInWithPassword({
      email: String(form.get("email") ?? ""),
      password: String(form.get("password") ?? ""),
      address: clientAddress(request),
    }),
  ),
  "password",
);
