import { SEARCH_SYNONYMS } from "./vocabulary";

// InnoDB FULLTEXT ignores tokens shorter than innodb_ft_min_token_size (3 by default).
const MIN_TOKEN = 3;

function quoteTerm(term: string): string {
  return term.includes(" ") || term.includes("-") ? `"${term}"` : `${term}*`;
}

/**
 * Turns what a builder typed into a MariaDB boolean-mode expression: every word (or known trade
 * phrase) is required, each with its synonyms as alternatives. Returns "" when nothing searchable is left.
 */
export function toBooleanQuery(text: string): string {
  let rest = ` ${text.toLowerCase().replace(/[^\p{L}\p{N}\s-]+/gu, " ").replace(/\s+/g, " ")} `;
  const groups: string[] = [];
  // Phrases first, longest first, so "vapor barrier" wins over "vapor".
  const phrases = Object.keys(SEARCH_SYNONYMS).filter((key) => key.includes(" ")).sort((a, b) => b.length - a.length);
  for (const phrase of phrases) {
    if (rest.includes(` ${phrase} `)) {
      groups.push(`+(${[phrase, ...SEARCH_SYNONYMS[phrase]].map(quoteTerm).join(" ")})`);
      rest = rest.replace(` ${phrase} `, " ");
    }
  }
  for (const word of rest.trim().split(" ").filter(Boolean)) {
    const synonyms = SEARCH_SYNONYMS[word] ?? [];
    const terms = [word, ...synonyms].filter((term) => term.length >= MIN_TOKEN).map((term) => term.replace(/^-+|-+$/g, ""));
    if (terms.length === 0) continue;
    groups.push(terms.length === 1 ? `+${quoteTerm(terms[0])}` : `+(${terms.map(quoteTerm).join(" ")})`);
  }
  return groups.join(" ");
}
