import { NavLink, Link } from "react-router";
import { STANDING_CAUTION } from "~/vocabulary/caution";
import { AccountMenu } from "./account-menu";

const nav = [
  { to: "/details", label: "Catalogue" },
  { to: "/sets", label: "Sets" },
  { to: "/pricing", label: "Pricing" },
];

export function AppShell({ children }: { children: React.ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="no-print border-b border-rule bg-sheet/70">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-8 gap-y-2 px-4 py-3">
          <Link to="/" className="flex items-baseline gap-2 no-underline">
            <span aria-hidden className="inline-block h-3 w-3 translate-y-[1px] rotate-45 border-2 border-ochre" />
            <span className="font-serif text-xl font-bold text-graphite">Dryside</span>
          </Link>
          <nav aria-label="Main" className="flex flex-wrap gap-5 text-sm">
            {nav.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                className={({ isActive }) =>
                  `no-underline ${isActive ? "text-graphite font-semibold border-b-2 border-ochre" : "text-graphite-soft hover:text-graphite"}`
                }
              >
                {item.label}
              </NavLink>
            ))}
          </nav>
          <AccountMenu />
        </div>
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-8">{children}</main>
      <footer className="border-t border-rule bg-paper-deep/60">
        <div className="mx-auto max-w-6xl px-4 py-6 text-sm text-graphite-soft">
          <p className="max-w-3xl" data-testid="standing-caution">
            <strong className="text-graphite">Caution.</strong> {STANDING_CAUTION}
          </p>
          <p className="mt-3">© Dryside — reviewed assembly details for the building envelope.</p>
        </div>
      </footer>
    </div>
  );
}
