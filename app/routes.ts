import { type RouteConfig, index, prefix, route } from "@react-router/dev/routes";

export default [
  index("routes/home.tsx"),
  route("details", "routes/catalogue/index.tsx"),
  route("details/:slug", "routes/details/detail.tsx"),
  route("preferences/units", "routes/preferences/units.ts"),
  route("healthz", "routes/healthz.ts"),

  route("sign-up", "routes/auth/sign-up.tsx"),
  route("sign-in", "routes/auth/sign-in.tsx"),
  route("sign-out", "routes/auth/sign-out.ts"),
  route("verify-email/:token", "routes/auth/verify-email.tsx"),
  route("forgot-password", "routes/auth/forgot-password.tsx"),
  route("reset-password/:token", "routes/auth/reset-password.tsx"),
  route("account", "routes/account/index.tsx"),
  ...prefix("admin", [
    index("routes/admin/index.tsx"),
    route("users", "routes/admin/users.tsx"),
    route("outbox", "routes/admin/outbox.tsx"),
    route("audit", "routes/admin/audit.tsx"),
  ]),

  ...prefix("api", [
    route("details", "routes/api/details.ts"),
    route("details/:slug", "routes/api/detail.ts"),
    route("details/:slug/check", "routes/api/detail-check.ts"),
    route("materials", "routes/api/materials.ts"),
    route("suggestions", "routes/api/suggestions.ts"),
  ]),
] satisfies RouteConfig;
