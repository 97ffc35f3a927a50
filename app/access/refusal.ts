// The one answer to "this is premium and you have no access to it", for the detail page, the API,
// drawings and packs alike: what was refused, why, and where access is sold.

export interface PremiumOffer {
  label: string;
  href: string;
}

export interface PremiumRefusal {
  error: "premium_required";
  message: string;
  /** The plans page first, then each set that contains the content. */
  offers: PremiumOffer[];
}

/** `what` names the refused thing in a sentence ("This detail", "This drawing", "The “Roofs” pack"). */
export function premiumRefusal(what: string, sets: readonly { slug: string; title: string }[]): PremiumRefusal {
  const where = sets.length === 1 ? `the “${sets[0].title}” set` : "a set that contains it";
  return {
    error: "premium_required",
    message: `${what} is premium: a plan or ${where} gives access.`,
    offers: [
      { label: "See plans", href: "/pricing" },
      ...sets.map((set) => ({ label: `Buy “${set.title}”`, href: `/sets#${set.slug}` })),
    ],
  };
}
