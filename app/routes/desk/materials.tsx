import { Link } from "react-router";
import type { Route } from "./+types/materials";
import { listMaterials } from "~/desk/materials-edit.server";

export const meta: Route.MetaFunction = () => [{ title: "Material library — Desk — Dryside" }];

export async function loader() {
  return { materials: await listMaterials() };
}

export default function Materials({ loaderData }: Route.ComponentProps) {
  return (
    <div className="space-y-6">
      <header>
        <p className="text-xs uppercase tracking-wide text-graphite-soft">
          <Link to="/desk">Desk</Link> / materials
        </p>
        <h1 className="text-3xl">Material library</h1>
        <p className="mt-2 max-w-prose text-graphite-soft">
          Every value carries its source and its status letter. A change is audit-logged and recomputes the published
          details that use the material.
        </p>
      </header>
      <table className="w-full text-left text-sm" data-testid="material-list">
        <thead>
          <tr className="border-b border-rule">
            <th className="py-2">Material</th>
            <th>Family</th>
            <th>Changed</th>
          </tr>
        </thead>
        <tbody>
          {loaderData.materials.map((m) => (
            <tr key={m.slug} className="border-b border-rule/60">
              <td className="py-1.5">
                <Link to={`/desk/materials/${m.slug}`}>{m.name}</Link>
              </td>
              <td>{m.family}</td>
              <td className="text-graphite-soft">{m.updatedAt.slice(0, 10)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
