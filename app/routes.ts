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
  route("account/billing", "routes/account/billing.tsx"),
  route("account/checkout/return", "routes/account/checkout-return.tsx"),
  route("pricing", "routes/pricing/index.tsx"),
  route("sets", "routes/sets/index.tsx"),
  route("sets/:slug/pack", "routes/sets/pack.ts"),
  ...prefix("admin", [
    index("routes/admin/index.tsx"),
    route("users", "routes/admin/users.tsx"),
    route("outbox", "routes/admin/outbox.tsx"),
    route("audit", "routes/admin/audit.tsx"),
    route("payments", "routes/admin/payments.tsx"),
  ]),

  ...prefix("api", [
    route("details", "routes/api/details.ts"),
    route("details/:slug", "routes/api/detail.ts"),
    route("details/:slug/check", "routes/api/detail-check.ts"),
    route("materials", "routes/api/materials.ts"),
    route("suggestions", "routes/api/suggestions.ts"),
    route("payments/webhook", "routes/api/payments-webhook.ts"),
  ]),
] satisfies RouteConfig;
