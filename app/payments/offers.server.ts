import { downloadableSetIds, hasLivePlan, type Viewer } from "~/access/premium.server";
import { Detail, DetailSet } from "~/models/index.server";
import { PLANS, planPriceLabel, setOffers, type SetOffer } from "./catalogue.server";

export interface PlanCard {
  slug: string;
  name: string;
  price: string;
  blurb: string;
}

export interface SetCard extends SetOffer {
  details: { slug: string; title: string; tier: "free" | "premium" }[];
  /** The viewer may download this set's pack (a plan, the bought set, or staff). */
  owned: boolean;
}

export interface Offers {
  plans: PlanCard[];
  sets: SetCard[];
  signedIn: boolean;
  hasPlan: boolean;
}

/** Plans and sets as the pricing and sets pages show them to this viewer. */
export async function offersFor(viewer: Viewer | null): Promise<Offers> {
  const [sets, members, owned, hasPlan] = await Promise.all([
    setOffers(),
    DetailSet.findAll({
      attributes: ["id"],
      include: [{ model: Detail.scope("live"), as: "details", attributes: ["slug", "title", "tier"], required: false }],
    }),
    downloadableSetIds(viewer),
    hasLivePlan(viewer),
  ]);
  const detailsBySet = new Map(
    members.map((set) => {
      const details = (set.details ?? []).map((d) => ({ slug: d.slug, title: d.title, tier: d.tier }));
      return [set.id, details.sort((a, b) => a.title.localeCompare(b.title))] as const;
    }),
  );
  return {
    plans: PLANS.map((plan) => ({ slug: plan.slug, name: plan.name, price: planPriceLabel(plan), blurb: plan.blurb })),
    sets: sets.map((set) => ({
      ...set,
      details: detailsBySet.get(set.id) ?? [],
      owned: owned === "all" || owned.has(set.id),
    })),
    signedIn: viewer !== null,
    hasPlan,
  };
}
