// The desk journey in a browser: an editor drafts the next revision of a detail with a drawing and submits
// it; a reviewer sends it back with a comment; the editor resubmits; another reviewer's approval publishes
// it, and the public page shows the new revision. Logins come from scripts/demo-accounts.ts.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { baseUrl, openBrowser, screenshot } from "./browser";

const DEMO_PASSWORD = "dryside-demo-password"; // scripts/demo-accounts.ts
const SLUG = "floor-over-vented-crawl-fibreglass-batts"; // a free detail of the demo library, revision 1
const DRAWING = `<svg xmlns="http://www.w3.org/2000/svg" width="120" height="40" onload="alert('x')"><script>alert(1)</script><rect x="4" y="4" width="112" height="32" fill="#ede5d3" stroke="#2c2c2a"/></svg>`;

const contexts: BrowserContext[] = [];
let editor: Page;
let reviewer: Page;
let visitor: Page;
beforeAll(async () => {
  // One browser profile per person, so their sessions never mix.
  contexts.push(...(await Promise.all([openBrowser(), openBrowser(), openBrowser()])));
  [editor, reviewer, visitor] = await Promise.all(contexts.map((context) => context.newPage()));
});
afterAll(async () => {
  await Promise.all(contexts.map((context) => context.close()));
});

async function signIn(page: Page, email: string, next: string) {
  await page.goto(`${baseUrl()}/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => url.pathname === next.split("?")[0]);
}

test("draft with a drawing → changes requested → resubmitted → published, and the public page shows it", async () => {
  // The editor starts the next revision; the published page is untouched meanwhile.
  await signIn(editor, "wren@dryside.invalid", `/desk/details/${SLUG}/edit`);
  await editor.getByRole("button", { name: "Start a new revision" }).click();
  await editor.waitForURL(/\/desk\/revisions\/\d+$/);
  const revisionPath = new URL(editor.url()).pathname;
  const revisionId = revisionPath.split("/").pop()!;

  await editor.getByLabel(/^Change note/).fill("Install sequence now says when to staple the batt supports.");
  const body = editor.getByLabel("Body (Markdown)");
  await body.fill(`${await body.inputValue()}\n\nStaple the batt supports every 450 mm before the subfloor goes down.`);
  // The live preview renders through the server's sanitiser as the editor types.
  await editor.getByTestId("body-preview").getByText("Staple the batt supports every 450 mm").waitFor();
  // The site check re-runs as the layer table changes.
  await editor.getByTestId("site-check-results").waitFor();
  const rBefore = await editor.getByTestId("effective-r").textContent();
  const thickness = editor.getByLabel("Layer 1 thickness in mm");
  await thickness.fill(String(Number(await thickness.inputValue()) + 20));
  await editor.waitForFunction(
    (before) => document.querySelector('[data-testid="effective-r"]')?.textContent !== before,
    rBefore,
  );

  // The layers are a list: a row is added and removed again, and moving a row moves what was typed in it.
  const rows = editor.getByTestId("layer-editor").locator("tbody tr");
  const count = await rows.count();
  await editor.getByRole("button", { name: "Add a layer on the interior side" }).click();
  await editor.getByTestId(`layer-row-${count}`).waitFor();
  await editor.getByRole("button", { name: `Remove layer ${count + 1}` }).click();
  await editor.getByTestId(`layer-row-${count}`).waitFor({ state: "detached" });
  const outermost = await editor.getByLabel("Layer 1 thickness in mm", { exact: true }).inputValue();
  await editor.getByRole("button", { name: "Move layer 1 inward" }).click();
  await expect.poll(() => editor.getByLabel("Layer 2 thickness in mm", { exact: true }).inputValue()).toBe(outermost);
  await editor.getByRole("button", { name: "Move layer 2 outward" }).click();
  await expect.poll(() => editor.getByLabel("Layer 1 thickness in mm", { exact: true }).inputValue()).toBe(outermost);

  // The page checks with the action's schema: a missing change note is reported before anything is sent.
  const note = editor.getByLabel(/^Change note/);
  const typedNote = await note.inputValue();
  await note.fill("");
  await editor.getByRole("button", { name: "Save draft" }).click();
  await editor.getByTestId("error-change_note").waitFor();
  await note.fill(typedNote);
  await editor.getByTestId("error-change_note").waitFor({ state: "detached" });

  // A drawing, sent with upload progress; the server keeps only the sanitised drawing.
  await editor
    .locator('input[type="file"]')
    .setInputFiles({ name: "batt-supports.svg", mimeType: "image/svg+xml", buffer: Buffer.from(DRAWING) });
  await editor.getByLabel("Caption").fill("Batt supports at 450 mm");
  await editor.getByRole("button", { name: "Attach" }).click();
  await editor.getByTestId("upload-list").getByText("batt-supports.svg").waitFor();
  await screenshot(editor, "desk-editor");

  await editor.getByRole("button", { name: "Submit for review" }).click();
  await editor.getByTestId("desk-notice").getByText("Submitted for review.").waitFor();

  // A reviewer finds it in the queue and sends it back with a comment.
  await signIn(reviewer, "idris@dryside.invalid", "/desk");
  await reviewer.getByTestId("review-queue").getByRole("link").first().click();
  await reviewer.waitForURL(new RegExp(`/desk/review/${revisionId}$`));
  await reviewer
    .getByTestId("body-diff")
    .getByText("Staple the batt supports every 450 mm", { exact: false })
    .waitFor();
  await reviewer.getByLabel("Install sequence", { exact: true }).fill("Say which side of the joist the supports go.");
  await reviewer.getByRole("button", { name: "Request changes" }).click();
  await reviewer.waitForURL(/\/desk\?sent-back=/);

  // The editor sees the comment and resubmits.
  await editor.goto(`${baseUrl()}${revisionPath}`);
  await editor.getByTestId("review-comments").getByText("Say which side of the joist the supports go.").waitFor();
  const again = editor.getByLabel("Body (Markdown)");
  await again.fill((await again.inputValue()).replace("every 450 mm", "every 450 mm on the underside of the joists"));
  await editor.getByRole("button", { name: "Submit for review" }).click();
  await editor.getByTestId("desk-notice").getByText("Submitted for review.").waitFor();

  // The reviewer approves; publication lands on the public page.
  await reviewer.goto(`${baseUrl()}/desk/review/${revisionId}`);
  await reviewer.getByRole("button", { name: "Approve and publish" }).click();
  await reviewer.waitForURL(new RegExp(`/details/${SLUG}\\?published=2$`));

  const page = visitor;
  await page.goto(`${baseUrl()}/details/${SLUG}`);
  const line = (await page.getByTestId("revision-line").textContent()) ?? "";
  expect(line).toMatch(/^Revision 2 /);
  expect(line).toContain("written by Wren Castellane");
  expect(line).toContain("reviewed by Idris Varrow");
  await page.getByTestId("detail-body").getByText("on the underside of the joists", { exact: false }).waitFor();
  expect(await page.getByTestId("revision-history").textContent()).toContain(
    "Install sequence now says when to staple the batt supports.",
  );
  // The drawing uploaded with the revision is shown with it, and loads.
  const drawing = page.getByTestId("attachments").locator("img").first();
  await drawing.waitFor({ state: "attached" });
  await drawing.scrollIntoViewIfNeeded();
  await page.waitForFunction(() =>
    [...document.querySelectorAll('[data-testid="attachments"] img')].every(
      (img) => (img as HTMLImageElement).naturalWidth > 0,
    ),
  );
  await screenshot(page, "desk-published");
}, 120_000); // three people's sessions in one journey: longer than the default on a busy machine
