import { useEffect, useId, useRef, useState } from "react";
import { useFetcher } from "react-router";
import type { Suggestion } from "~/catalogue/suggestions";

type FuseInstance = { search: (text: string, options?: { limit: number }) => { item: Suggestion }[] };

/**
 * Text search with typeahead. The suggestion list (titles, materials, trade synonyms) is fetched
 * once, on first focus, and searched in the browser with fuse.js, which is also loaded lazily.
 */
export function SearchBox({ defaultValue, name = "q" }: { defaultValue: string; name?: string }) {
  const corpus = useFetcher<{ suggestions: Suggestion[] }>();
  const [fuse, setFuse] = useState<FuseInstance | null>(null);
  const [text, setText] = useState(defaultValue);
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(-1);
  const listId = useId();
  const inputRef = useRef<HTMLInputElement>(null);

  useEffect(() => setText(defaultValue), [defaultValue]);

  useEffect(() => {
    const suggestions = corpus.data?.suggestions;
    if (!suggestions || fuse) return;
    let cancelled = false;
    import("fuse.js").then(({ default: Fuse }) => {
      if (!cancelled) setFuse(new Fuse(suggestions, { keys: ["text", "hint"], threshold: 0.35, ignoreLocation: true }));
    });
    return () => {
      cancelled = true;
    };
  }, [corpus.data, fuse]);

  const matches = fuse && text.trim().length >= 2 ? fuse.search(text.trim(), { limit: 8 }).map((r) => r.item) : [];

  function choose(suggestion: Suggestion) {
    if (suggestion.href) {
      window.location.assign(suggestion.href);
      return;
    }
    setText(suggestion.text);
    setOpen(false);
    const form = inputRef.current?.form;
    if (form && inputRef.current) {
      inputRef.current.value = suggestion.text;
      form.requestSubmit();
    }
  }

  return (
    <div className="relative">
      <label htmlFor={`${listId}-input`} className="sr-only">
        Search details
      </label>
      <input
        ref={inputRef}
        id={`${listId}-input`}
        type="search"
        name={name}
        value={text}
        autoComplete="off"
        placeholder="Search: sealed crawlspace, exterior foam, rim joist…"
        role="combobox"
        aria-expanded={open && matches.length > 0}
        aria-controls={listId}
        aria-activedescendant={active >= 0 ? `${listId}-${active}` : undefined}
        className="w-full rounded border border-rule bg-sheet px-3 py-2"
        onFocus={() => {
          if (corpus.state === "idle" && !corpus.data) corpus.load("/api/suggestions");
          setOpen(true);
        }}
        onBlur={() => setTimeout(() => setOpen(false), 150)}
        onChange={(event) => {
          setText(event.target.value);
          setOpen(true);
          setActive(-1);
        }}
        onKeyDown={(event) => {
          if (!open || matches.length === 0) return;
          if (event.key === "ArrowDown") {
            event.preventDefault();
            setActive((i) => (i + 1) % matches.length);
          } else if (event.key === "ArrowUp") {
            event.preventDefault();
            setActive((i) => (i <= 0 ? matches.length - 1 : i - 1));
          } else if (event.key === "Enter" && active >= 0) {
            event.preventDefault();
            choose(matches[active]);
          } else if (event.key === "Escape") {
            setOpen(false);
          }
        }}
      />
      {open && matches.length > 0 ? (
        // The WAI-ARIA combobox pattern: focus stays in the input, aria-activedescendant points at the option.
        <ul
          id={listId}
          // biome-ignore lint/a11y/noNoninteractiveElementToInteractiveRole: a listbox of options is the pattern's own markup
          role="listbox"
          className="absolute z-20 mt-1 w-full overflow-hidden rounded border border-rule bg-sheet shadow-lg"
          data-testid="suggestions"
        >
          {matches.map((suggestion, i) => (
            // biome-ignore lint/a11y/useFocusableInteractive: options are reached by aria-activedescendant, never focused
            <li
              key={`${suggestion.kind}-${suggestion.text}`}
              id={`${listId}-${i}`}
              // biome-ignore lint/a11y/noNoninteractiveElementToInteractiveRole: an option inside the listbox above
              role="option"
              aria-selected={i === active}
              className={`cursor-pointer px-3 py-1.5 text-sm ${i === active ? "bg-paper-deep" : ""}`}
              onMouseDown={(event) => {
                event.preventDefault();
                choose(suggestion);
              }}
            >
              <span>{suggestion.text}</span>
              <span className="ml-2 text-xs text-graphite-soft">{suggestion.hint}</span>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
