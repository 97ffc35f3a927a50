import createDOMPurify from "dompurify";
import { JSDOM } from "jsdom";
import { Marked } from "marked";

// One parser and one sanitiser per process: jsdom windows are expensive to create.
const marked = new Marked({ gfm: true, breaks: false, async: false });
const purify = createDOMPurify(new JSDOM("").window);

/** Markdown written by editors, rendered and sanitised on the server; safe to inject as HTML. */
export function renderMarkdown(markdown: string): string {
  const html = marked.parse(markdown) as string;
  return purify.sanitize(html, {
    USE_PROFILES: { html: true },
    FORBID_TAGS: ["style", "form", "input"],
    FORBID_ATTR: ["style"],
  });
}
