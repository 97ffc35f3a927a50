import { SEARCH_SYNONYMS } from "./vocabulary";

// InnoDB FULLTEXT ignores tokens shorter than innodb_ft_min_token_size (3 by default).
const MIN_TOKEN = 3;

// Multi-word terms become "all of these words" rather than a phrase: InnoDB phrase matching reads
// word positions and cost several times more at 10,000 details (npm run bench).
function quoteTerm(term: string): string {
  const words = term.split(/[\s-]+/).filter((word) => word.length >= MIN_TOKEN);
  if (words.length === 0) return "";
  return words.length === 1 ? `${words[0]}*` : `(${words.map((word) => `+${word}*`).join(" ")})`;
}

/**
 * Turns what a builder typed into a MariaDB boolean-mode expression: every word (or known trade
 * phrase) is required, each with its synonyms as alternatives. Returns "" when nothing searchable is left.
 */
export function toBooleanQuery(text: string): string {
  let rest = ` ${text
    .toLowerCase()
    .replace(/[^\p{L}\p{N}\s-]+/gu, " ")
    .replace(/\s+/g, " ")} `;
  const groups: string[] = [];
  // Phrases first, longest first, so "vapor barrier" wins over "vapor".
  const phrases = Object.keys(SEARCH_SYNONYMS)
    .filter((key) => key.includes(" "))
    .sort((a, b) => b.length - a.length);
  for (const phrase of phrases) {
    if (rest.includes(` ${phrase} `)) {
      groups.push(`+(${[phrase, ...SEARCH_SYNONYMS[phrase]].map(quoteTerm).filter(Boolean).join(" ")})`);
      rest = rest.replace(` ${phrase} `, " ");
    }
  }
  for (const word of rest.trim().split(" ").filter(Boolean)) {
    const synonyms = SEARCH_SYNONYMS[word] ?? [];
    const terms = [word, ...synonyms]
      .filter((term) => term.length >= MIN_TOKEN)
      .map((term) => term.replace(/^-+|-+$/g, ""));
    if (terms.length === 0) continue;
    const quoted = terms.map(quoteTerm).filter(Boolean);
    if (quoted.length) groups.push(quoted.length === 1 ? `+${quoted[0]}` : `+(${quoted.join(" ")})`);
  }
  return groups.join(" ");
}
