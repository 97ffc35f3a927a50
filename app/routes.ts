import { type RouteConfig, index, layout, prefix, route } from "@react-router/dev/routes";

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
  // Each area's layout loads nothing itself: its middleware refuses anyone below the area's role.
  layout("routes/account/layout.tsx", [
    route("account", "routes/account/index.tsx"),
    route("account/billing", "routes/account/billing.tsx"),
    route("account/checkout/return", "routes/account/checkout-return.tsx"),
  ]),
  route("pricing", "routes/pricing/index.tsx"),
  route("sets", "routes/sets/index.tsx"),
  route("sets/:slug/pack", "routes/sets/pack.ts"),
  layout("routes/admin/layout.tsx", [
    ...prefix("admin", [
      index("routes/admin/index.tsx"),
      route("users", "routes/admin/users.tsx"),
      route("outbox", "routes/admin/outbox.tsx"),
      route("audit", "routes/admin/audit.tsx"),
      route("payments", "routes/admin/payments.tsx"),
    ]),
  ]),

  layout("routes/desk/layout.tsx", [
    ...prefix("desk", [
      index("routes/desk/index.tsx"),
      route("new", "routes/desk/new.tsx"),
      route("details/:slug/edit", "routes/desk/start-revision.tsx"),
      route("details/:slug/withdraw", "routes/desk/withdraw.tsx"),
      route("revisions/:id", "routes/desk/revision.tsx"),
      route("revisions/:id/export", "routes/desk/export.ts"),
      route("revisions/:id/uploads", "routes/desk/uploads.ts"),
      route("review/:id", "routes/desk/review.tsx"),
      route("materials", "routes/desk/materials.tsx"),
      route("materials/:slug", "routes/desk/material.tsx"),
      route("api/check", "routes/desk/api-check.ts"),
      route("api/preview", "routes/desk/api-preview.ts"),
    ]),
  ]),
  route("uploads/:id", "routes/uploads/file.ts"),
  route("details/:slug/save", "routes/details/save.ts"),

  ...prefix("api", [
    route("details", "routes/api/details.ts"),
    route("details/:slug", "routes/api/detail.ts"),
    route("details/:slug/check", "routes/api/detail-check.ts"),
    route("materials", "routes/api/materials.ts"),
    route("suggestions", "routes/api/suggestions.ts"),
    route("payments/webhook", "routes/api/payments-webhook.ts"),
  ]),
] satisfies RouteConfig;
