import { type RouteConfig, index, prefix, route } from "@react-router/dev/routes";

export default [
  index("routes/home.tsx"),
  route("details", "routes/catalogue/index.tsx"),
  route("details/:slug", "routes/details/detail.tsx"),
  route("preferences/units", "routes/preferences/units.ts"),
  route("healthz", "routes/healthz.ts"),

  ...prefix("api", [
    route("details", "routes/api/details.ts"),
    route("details/:slug", "routes/api/detail.ts"),
    route("details/:slug/check", "routes/api/detail-check.ts"),
    route("materials", "routes/api/materials.ts"),
    route("suggestions", "routes/api/suggestions.ts"),
  ]),
] satisfies RouteConfig;
