// The editors' desk as a specification: draft → submit → changes requested → resubmit → approved and
// published as the next revision; no reviewer approves their own work; invalid forms keep what was typed;
// uploads are typed by content and served only to those who may read them; withdrawal.
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";
import { useMailCatcher } from "../helpers/mail";
import { RouteClient } from "../helpers/route-client";
import type { DraftFormValues } from "~/desk/draft-form";

process.env.STORAGE_DIR = mkdtempSync(join(process.env.TEST_SCRATCH_DIR ?? tmpdir(), "desk-storage-"));
const mail = useMailCatcher();
useMigratedDatabase();

const FREE_SLUG = "basement-icf-wall"; // content/details/basement-icf-wall.md, tier free, revision 1
const PREMIUM_SLUG = "basement-block-wall-interior-xps"; // tier premium
const password = "desk workflow passphrase"; // our own minimum is 12 characters

const people = {
  editor: { email: "editor@example.test", displayName: "Maelis Ortega-Finch", role: "editor" as const },
  reviewer: { email: "reviewer@example.test", displayName: "Corvin Aldersey", role: "reviewer" as const },
  otherReviewer: { email: "reviewer2@example.test", displayName: "Ilse Marrowby", role: "reviewer" as const },
  member: { email: "member@example.test", displayName: "Tobin Reedwater", role: "member" as const },
};
type Person = keyof typeof people;
const browsers = {} as Record<Person, RouteClient>;
const ids = {} as Record<Person, number>;

beforeAll(async () => {
  const { importContent } = await import("~/catalogue/import.server");
  await importContent("content");
  const { User } = await import("~/models/index.server");
  const { hashPassword } = await import("~/auth/password.server");
  const signIn = await import("~/routes/auth/sign-in");
  const passwordHash = await hashPassword(password);
  for (const [key, person] of Object.entries(people) as [Person, (typeof people)[Person]][]) {
    const user = await User.create({ ...person, passwordHash, emailVerifiedAt: new Date() });
    ids[key] = user.id;
    browsers[key] = new RouteClient();
    const result = await browsers[key].submit(signIn.action, "/sign-in", { email: person.email, password });
    if (result.status !== 302) throw new Error(`could not sign in ${key}`);
  }
});

/** The editor form's fields as the browser posts them: checkbox groups repeated, layer rows named `layers[i].field`. */
function formPairs(values: DraftFormValues, intent: "save" | "submit"): [string, string][] {
  const pairs: [string, string][] = [["intent", intent]];
  for (const key of [
    "slug",
    "title",
    "summary",
    "assembly",
    "substrate",
    "below_grade",
    "strategy",
    "tier",
    "references",
    "change_note",
    "body",
  ] as const)
    pairs.push([key, values[key]]);
  for (const zone of values.zones) pairs.push(["zones", zone]);
  for (const set of values.sets) pairs.push(["sets", set]);
  values.layers.forEach((layer, i) => {
    for (const [field, value] of Object.entries(layer)) pairs.push([`layers[${i}].${field}`, value]);
  });
  return pairs;
}

function revisionIdFrom(location: string | null): number {
  const id = Number(/\/desk\/revisions\/(\d+)/.exec(location ?? "")?.[1]);
  if (!id) throw new Error(`no revision id in ${location}`);
  return id;
}

async function routes() {
  return {
    start: await import("~/routes/desk/start-revision"),
    revision: await import("~/routes/desk/revision"),
    review: await import("~/routes/desk/review"),
    withdraw: await import("~/routes/desk/withdraw"),
    save: await import("~/routes/details/save"),
    file: await import("~/routes/uploads/file"),
    newDetail: await import("~/routes/desk/new"),
    material: await import("~/routes/desk/material"),
  };
}

async function startDraft(who: Person, slug: string): Promise<{ id: number; values: DraftFormValues }> {
  const r = await routes();
  const started = await browsers[who].submit(r.start.action, `/desk/details/${slug}/edit`, {}, { slug });
  expect(started.status).toBe(302);
  const id = revisionIdFrom(started.headers.get("Location"));
  const page = await browsers[who].call(r.revision.loader, `/desk/revisions/${id}`, { id: String(id) });
  expect(page.status).toBe(200);
  return { id, values: (page.body as { values: DraftFormValues }).values };
}

test("a draft goes to review, comes back with comments, is resubmitted, approved and published as the next revision", async () => {
  const r = await routes();
  const { Detail, DetailRevision, AuditEvent, ReviewComment } = await import("~/models/index.server");
  const { getDetailView } = await import("~/catalogue/detail.server");

  // A member saves the detail, so the publication must reach them.
  const saved = await browsers.member.submit(
    r.save.action,
    `/details/${FREE_SLUG}/save`,
    { intent: "save" },
    { slug: FREE_SLUG },
  );
  expect(saved.body).toEqual({ saved: true });

  const before = await Detail.findOne({ where: { slug: FREE_SLUG } });
  const firstRevisionId = before!.publishedRevisionId!;
  const { id, values } = await startDraft("editor", FREE_SLUG);

  // The draft never touches the published revision.
  expect((await getDetailView(FREE_SLUG, null))!.revision.number).toBe(1);

  const edited: DraftFormValues = {
    ...values,
    change_note: "Inner foam face thickened for the colder zones.",
    body: values.body.replace(
      "## Install sequence",
      "## Install sequence\n\nSet the forms plumb before the pour; brace every corner.",
    ),
    layers: values.layers.map((layer, i) => (i === 2 ? { ...layer, thickness_mm: "100" } : layer)),
  };
  const submitted = await browsers.editor.submitPairs(
    r.revision.action,
    `/desk/revisions/${id}`,
    formPairs(edited, "submit"),
    { id: String(id) },
  );
  expect(submitted.status).toBe(302);
  expect((await DetailRevision.findByPk(id))!.state).toBe("in_review");

  // An editor is not a reviewer: the review action refuses them on the server.
  const byEditor = await browsers.editor.submit(
    r.review.action,
    `/desk/review/${id}`,
    { intent: "approve" },
    { id: String(id) },
  );
  expect(byEditor.status).toBe(403);

  // The reviewer sees a readable diff against the published revision.
  const reviewPage = await browsers.reviewer.call(r.review.loader, `/desk/review/${id}`, { id: String(id) });
  const review = reviewPage.body as {
    changes: string[];
    bodyDiff: { kind: string; text?: string }[];
    canDecide: boolean;
  };
  expect(review.canDecide).toBe(true);
  expect(review.changes).toContain("icf-eps-form: 63 mm → 100 mm.");
  expect(review.bodyDiff).toContainEqual({
    kind: "added",
    text: "Set the forms plumb before the pour; brace every corner.",
  });

  const sentBack = await browsers.reviewer.submit(
    r.review.action,
    `/desk/review/${id}`,
    {
      intent: "request-changes",
      "comments.layers": "Say which face is thickened.",
      "comments.cautions": "Add the termite caution.",
    },
    { id: String(id) },
  );
  expect(sentBack.status).toBe(302);
  expect((await DetailRevision.findByPk(id))!.state).toBe("changes_requested");
  const comments = await ReviewComment.findAll({ where: { revisionId: id }, order: [["id", "ASC"]] });
  expect(comments.map((c) => [c.section, c.body])).toEqual([
    ["layers", "Say which face is thickened."],
    ["cautions", "Add the termite caution."],
  ]);

  // The author sees the comments and resubmits.
  const again = await browsers.editor.call(r.revision.loader, `/desk/revisions/${id}`, { id: String(id) });
  expect((again.body as { comments: { section: string }[]; editable: boolean }).comments).toHaveLength(2);
  expect((again.body as { editable: boolean }).editable).toBe(true);
  const resubmitted = await browsers.editor.submitPairs(
    r.revision.action,
    `/desk/revisions/${id}`,
    formPairs({ ...edited, change_note: "Interior foam face thickened to 100 mm for the colder zones." }, "submit"),
    { id: String(id) },
  );
  expect(resubmitted.status).toBe(302);
  expect((await DetailRevision.findByPk(id))!.state).toBe("in_review");

  const approved = await browsers.reviewer.submit(
    r.review.action,
    `/desk/review/${id}`,
    { intent: "approve" },
    { id: String(id) },
  );
  expect(approved.status).toBe(302);
  expect(approved.headers.get("Location")).toBe(`/details/${FREE_SLUG}?published=2`);

  const after = await Detail.findOne({ where: { slug: FREE_SLUG } });
  expect(after!.publishedRevisionId).toBe(id);
  // 37 mm more EPS at 0.03606 W/(m·K) adds 0.037 / 0.03606 ≈ RSI 1.03 in series
  // (content/materials/icf-eps-form.yaml: EPS Type II ≈ per inch, docs/references.md §3, status M).
  expect(after!.rValueRsi! - before!.rValueRsi!).toBeCloseTo(1.03, 1);
  expect(after!.layerStrip[2]).toMatchObject({ role: "insulation", thickness_mm: 100 });
  expect((await DetailRevision.findByPk(firstRevisionId))!.state).toBe("superseded");
  const published = await DetailRevision.findByPk(id);
  expect(published).toMatchObject({ state: "published", reviewerName: "Corvin Aldersey", reviewerId: ids.reviewer });
  expect(published!.frontMatter.reviewer).toBe("Corvin Aldersey");

  const view = await getDetailView(FREE_SLUG, null);
  expect(view!.revision).toMatchObject({
    number: 2,
    reviewerName: "Corvin Aldersey",
    authorName: "Maelis Ortega-Finch",
  });

  const audit = await AuditEvent.findAll({ where: { subjectType: "detail", subjectId: String(after!.id) } });
  expect(audit.map((event) => event.action)).toEqual(expect.arrayContaining(["detail.published", "detail.superseded"]));
  expect(audit.find((event) => event.action === "detail.published" && event.actorId === ids.reviewer)).toBeDefined();

  const alert = mail.outbox().find((message) => message.to.includes(people.member.email));
  expect(alert?.subject).toBe("Revised: ICF basement wall with a membrane and drainage mat (revision 2)");
  expect(alert?.text).toContain("Interior foam face thickened to 100 mm for the colder zones.");
  expect(alert?.text).toContain(`/details/${FREE_SLUG}`);
});

test("a reviewer can never approve their own revision, and nothing changes when they try", async () => {
  const r = await routes();
  const { Detail, DetailRevision, AuditEvent } = await import("~/models/index.server");
  const { id, values } = await startDraft("reviewer", PREMIUM_SLUG);
  const submitted = await browsers.reviewer.submitPairs(
    r.revision.action,
    `/desk/revisions/${id}`,
    formPairs({ ...values, change_note: "Cautions reordered for the crew." }, "submit"),
    { id: String(id) },
  );
  expect(submitted.status).toBe(302);
  const detailBefore = await Detail.findOne({ where: { slug: PREMIUM_SLUG } });
  const auditBefore = await AuditEvent.count();

  const own = await browsers.reviewer.submit(
    r.review.action,
    `/desk/review/${id}`,
    { intent: "approve" },
    { id: String(id) },
  );
  expect(own.status).toBe(403);
  expect((own.body as { result: { error: Record<string, string[]> } }).result.error[""].join(" ")).toMatch(
    /another reviewer/,
  );
  const ownSendBack = await browsers.reviewer.submit(
    r.review.action,
    `/desk/review/${id}`,
    { intent: "request-changes", "comments.metadata": "self" },
    { id: String(id) },
  );
  expect(ownSendBack.status).toBe(403);

  expect((await DetailRevision.findByPk(id))!.state).toBe("in_review");
  expect((await Detail.findOne({ where: { slug: PREMIUM_SLUG } }))!.publishedRevisionId).toBe(
    detailBefore!.publishedRevisionId,
  );
  expect(await AuditEvent.count()).toBe(auditBefore);
  const page = await browsers.reviewer.call(r.review.loader, `/desk/review/${id}`, { id: String(id) });
  expect(page.body).toMatchObject({ own: true, canDecide: false });

  // Another reviewer may.
  const other = await browsers.otherReviewer.submit(
    r.review.action,
    `/desk/review/${id}`,
    { intent: "approve" },
    { id: String(id) },
  );
  expect(other.status).toBe(302);
});

test("an invalid form answers 400 with field errors, keeps what was typed, and saves nothing", async () => {
  const r = await routes();
  const { DetailRevision } = await import("~/models/index.server");
  const slug = "rim-joist-cut-and-cobble-xps";
  const { id, values } = await startDraft("editor", slug);
  const before = await DetailRevision.findByPk(id);
  const typed: DraftFormValues = {
    ...values,
    title: "Rim",
    change_note: "",
    zones: [],
    layers: values.layers.map((layer, i) =>
      i === 0 ? { ...layer, thickness_mm: "-5" } : i === 1 ? { ...layer, material: "unobtainium-board" } : layer,
    ),
  };
  const result = await browsers.editor.submitPairs(
    r.revision.action,
    `/desk/revisions/${id}`,
    formPairs(typed, "save"),
    { id: String(id) },
  );
  expect(result.status).toBe(400);
  // conform's reply: what was typed comes back as the form's values, each error under its field's name.
  const { result: reply } = result.body as {
    result: { initialValue: DraftFormValues; error: Record<string, string[]> };
  };
  expect(reply.initialValue.title).toBe("Rim");
  expect(reply.initialValue.layers[0].thickness_mm).toBe("-5");
  expect(reply.initialValue.layers[1].material).toBe("unobtainium-board");
  expect(Object.keys(reply.error).sort()).toEqual([
    "change_note",
    "layers[0].thickness_mm",
    "layers[1].material",
    "title",
    "zones",
  ]);
  expect(reply.error["layers[1].material"].join(" ")).toMatch(/not in the material library/);
  const after = await DetailRevision.findByPk(id);
  expect(after!.contentHash).toBe(before!.contentHash);
  expect(after!.updatedAt.getTime()).toBe(before!.updatedAt.getTime());

  // Submitting needs the body's required sections as well.
  const noSections = await browsers.editor.submitPairs(
    r.revision.action,
    `/desk/revisions/${id}`,
    formPairs({ ...values, change_note: "Body shortened for the crew sheet.", body: "Just a paragraph." }, "submit"),
    { id: String(id) },
  );
  expect(noSections.status).toBe(400);
  expect(Object.keys((noSections.body as { result: { error: object } }).result.error)).toEqual(["body"]);
});

test("a new detail starts as a draft that stays out of the catalogue", async () => {
  const r = await routes();
  const { getDetailView } = await import("~/catalogue/detail.server");
  const { DetailRevision, Detail } = await import("~/models/index.server");
  const pairs = formPairs(
    {
      slug: "test-wall-with-exterior-mineral-wool",
      title: "Test wall with exterior mineral wool",
      summary: "A wood-frame wall with mineral wool board outside the sheathing and a vented rainscreen.",
      assembly: "above-grade-wall",
      substrate: "wood-frame",
      below_grade: "none",
      strategy: "cavity-plus-exterior",
      tier: "free",
      zones: ["5A", "6A"],
      sets: [],
      references: "IRC 2021 R702.7 (vapour retarders)",
      change_note: "",
      body: "## Why it works\n\nDraft.",
      layers: [
        {
          role: "cladding",
          material: "fibre-cement-lap-siding",
          thickness_mm: "8",
          framing_material: "",
          framing_fraction: "",
          joints: "",
        },
        {
          role: "drainage-gap",
          material: "vented-air-space",
          thickness_mm: "19",
          framing_material: "",
          framing_fraction: "",
          joints: "",
        },
        {
          role: "insulation",
          material: "mineral-wool-board",
          thickness_mm: "50",
          framing_material: "",
          framing_fraction: "",
          joints: "",
        },
        {
          role: "sheathing",
          material: "osb",
          thickness_mm: "11",
          framing_material: "",
          framing_fraction: "",
          joints: "",
        },
        {
          role: "insulation",
          material: "fibreglass-batt",
          thickness_mm: "140",
          framing_material: "softwood-lumber",
          framing_fraction: "0.23",
          joints: "",
        },
        {
          role: "interior-finish",
          material: "gypsum-board",
          thickness_mm: "12.7",
          framing_material: "",
          framing_fraction: "",
          joints: "",
        },
      ],
    },
    "save",
  );
  const created = await browsers.editor.submitPairs(r.newDetail.action, "/desk/new", pairs);
  expect(created.status).toBe(302);
  const id = revisionIdFrom(created.headers.get("Location"));
  expect(await DetailRevision.findByPk(id)).toMatchObject({ number: 1, state: "draft", authorId: ids.editor });
  expect(
    (await Detail.findOne({ where: { slug: "test-wall-with-exterior-mineral-wool" } }))!.publishedRevisionId,
  ).toBeNull();
  expect(await getDetailView("test-wall-with-exterior-mineral-wool", null)).toBeNull();

  const duplicate = await browsers.editor.submitPairs(r.newDetail.action, "/desk/new", pairs);
  expect(duplicate.status).toBe(400);
  expect((duplicate.body as { result: { error: Record<string, string[]> } }).result.error.slug).toBeDefined();
});

// Minimal valid files, built here byte by byte.
const PNG_BYTES = Buffer.from("89504e470d0a1a0a0000000d4948445200000001000000010806000000", "hex"); // PNG signature, ISO/IEC 15948 §5.2
const SCRIPTED_SVG = `<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" width="40" height="20" onload="alert(1)"><script>alert(2)</script><a href="javascript:alert(3)"><rect width="40" height="20" fill="#b0761a"/></a><foreignObject><p>x</p></foreignObject></svg>`;

test("uploads are typed by their bytes: a PNG named .svg is refused, a script-bearing SVG is stored sanitised", async () => {
  const { startRevision, DeskError } = await import("~/desk/revisions.server");
  const { storeUpload } = await import("~/desk/uploads.server");
  const { Upload } = await import("~/models/index.server");
  const { blobStorage } = await import("~/storage/storage.server");
  const editor = { id: ids.editor, displayName: people.editor.displayName, role: "editor" as const };
  const { revisionId } = await startRevision(editor, "floor-over-vented-crawl-fibreglass-batts");

  const refused = await storeUpload(editor, revisionId, new File([PNG_BYTES], "section.svg"), "").catch(
    (e: unknown) => e,
  );
  expect(refused).toBeInstanceOf(DeskError);
  expect((refused as Error).message).toMatch(/named \.svg but its content is PNG/);
  const notAFile = await storeUpload(editor, revisionId, new File(["#!/bin/sh\necho hi\n"], "notes.txt"), "").catch(
    (e: unknown) => e,
  );
  expect((notAFile as Error).message).toMatch(/Only SVG, PNG, JPEG and PDF/);
  const tooBig = await storeUpload(
    editor,
    revisionId,
    new File([Buffer.concat([PNG_BYTES, Buffer.alloc(5 * 1024 * 1024)])], "big.png"),
    "",
  ).catch((e: unknown) => e);
  expect((tooBig as Error).message).toMatch(/larger than 5 MB/);

  const png = await storeUpload(editor, revisionId, new File([PNG_BYTES], "photo.png"), "site photo");
  expect(png).toMatchObject({ contentType: "image/png", byteSize: PNG_BYTES.length });

  const svg = await storeUpload(editor, revisionId, new File([SCRIPTED_SVG], "drawing.svg"), "");
  expect(svg.contentType).toBe("image/svg+xml");
  const stored = await blobStorage().get((await Upload.findByPk(svg.id))!.storageKey);
  const chunks: Buffer[] = [];
  for await (const chunk of stored!.body) chunks.push(chunk as Buffer);
  const text = Buffer.concat(chunks).toString("utf8");
  expect(text).toContain("<rect");
  expect(text).not.toMatch(/script|onload|javascript:|foreignObject/i);

  // Someone else's draft is not theirs to attach to.
  const reviewer = { id: ids.reviewer, displayName: people.reviewer.displayName, role: "reviewer" as const };
  const notAuthor = await storeUpload(reviewer, revisionId, new File([PNG_BYTES], "photo.png"), "").catch(
    (e: unknown) => e,
  );
  expect((notAuthor as InstanceType<typeof DeskError>).status).toBe(403);
});

test("a draft's files are for editors only; a published revision's files follow the detail's tier", async () => {
  const r = await routes();
  const { startRevision, saveRevision, approveAndPublish } = await import("~/desk/revisions.server");
  const { storeUpload } = await import("~/desk/uploads.server");
  const { valuesFromFrontMatter } = await import("~/desk/draft-form");
  const { DetailRevision } = await import("~/models/index.server");
  const editor = { id: ids.editor, displayName: people.editor.displayName, role: "editor" as const };
  const reviewer = { id: ids.reviewer, displayName: people.reviewer.displayName, role: "reviewer" as const };
  const visitor = new RouteClient();

  const cases = [
    { slug: "basement-closed-cell-spray-foam-cast-wall", tier: "premium", visitorAfter: 403, memberAfter: 403 },
    { slug: "rim-joist-cut-and-cobble-xps", tier: "free", visitorAfter: 200, memberAfter: 200 },
  ];
  for (const c of cases) {
    // The rim joist already has the invalid-form test's open draft by the same editor: startRevision reuses it.
    const { revisionId } = await startRevision(editor, c.slug);
    const upload = await storeUpload(editor, revisionId, new File([PNG_BYTES], "photo.png"), "");
    const path = `/uploads/${upload.id}`;
    const params = { id: String(upload.id) };
    expect((await visitor.call(r.file.loader, path, params)).status, `${c.slug} draft, visitor`).toBe(404);
    expect((await browsers.member.call(r.file.loader, path, params)).status, `${c.slug} draft, member`).toBe(404);
    const asEditor = await browsers.editor.call(r.file.loader, path, params);
    expect(asEditor.status).toBe(200);
    expect(asEditor.headers.get("Content-Type")).toBe("image/png");
    expect(asEditor.headers.get("X-Content-Type-Options")).toBe("nosniff");

    const revision = await DetailRevision.findByPk(revisionId);
    const values = valuesFromFrontMatter(revision!.frontMatter, revision!.bodyMd);
    const saved = await saveRevision(
      editor,
      revisionId,
      { ...values, change_note: "Site photo of the finished rim added." },
      true,
    );
    expect(saved.ok).toBe(true);
    await approveAndPublish(reviewer, revisionId);
    const published = await visitor.call(r.file.loader, path, params);
    expect(published.status, `${c.slug} published, visitor`).toBe(c.visitorAfter);
    if (c.visitorAfter === 403)
      expect(published.body).toMatchObject({
        error: "premium_required",
        message: expect.stringMatching(/^This drawing is premium/),
      });
    expect((await browsers.member.call(r.file.loader, path, params)).status, `${c.slug} published, member`).toBe(
      c.memberAfter,
    );
  }
});

test("a reviewer withdraws a published detail with a reason; an editor cannot", async () => {
  const r = await routes();
  const { Detail, DetailRevision, AuditEvent } = await import("~/models/index.server");
  const { getDetailView } = await import("~/catalogue/detail.server");
  const slug = "basement-exterior-mineral-wool-drainage-board";
  const path = `/desk/details/${slug}/withdraw`;

  expect(
    (await browsers.editor.submit(r.withdraw.action, path, { reason: "Editors may not withdraw." }, { slug })).status,
  ).toBe(403);
  const short = await browsers.reviewer.submit(r.withdraw.action, path, { reason: "no" }, { slug });
  expect(short.status).toBe(400);
  expect(await getDetailView(slug, null)).not.toBeNull();

  const done = await browsers.reviewer.submit(
    r.withdraw.action,
    path,
    { reason: "Drainage board product class discontinued; rewrite pending." },
    { slug },
  );
  expect(done.status).toBe(302);
  const detail = await Detail.findOne({ where: { slug } });
  expect(detail!.withdrawnAt).not.toBeNull();
  expect((await DetailRevision.findByPk(detail!.publishedRevisionId!))!.state).toBe("withdrawn");
  expect(await getDetailView(slug, null)).toBeNull();
  const event = await AuditEvent.findOne({ where: { action: "detail.withdrawn", subjectId: String(detail!.id) } });
  expect(event).toMatchObject({ actorId: ids.reviewer });
});

test("a material edit needs a source for every value, is audit-logged, and recomputes the details that use it", async () => {
  const r = await routes();
  const { Detail, AuditEvent } = await import("~/models/index.server");
  const { findMaterial } = await import("~/desk/materials-edit.server");
  const { materialToForm } = await import("~/desk/material-form");
  const slug = "icf-eps-form";
  const values = materialToForm((await findMaterial(slug))!);
  const toPairs = (v: typeof values): Record<string, string> =>
    ({
      ...Object.fromEntries(Object.entries(v).filter(([k]) => k !== "flags")),
      ...(v.flags[0] ? { flags: v.flags[0] } : {}),
    }) as Record<string, string>;

  const missing = await browsers.editor.submit(
    r.material.action,
    `/desk/materials/${slug}`,
    toPairs({ ...values, thermal_source: "" }),
    { slug },
  );
  expect(missing.status).toBe(400);
  expect(Object.keys((missing.body as { result: { error: object } }).result.error)).toContain("thermal_source");

  const before = await Detail.findOne({ where: { slug: "basement-icf-wall" } });
  const halved = String(Number(values.thermal_value) / 2);
  const ok = await browsers.editor.submit(
    r.material.action,
    `/desk/materials/${slug}`,
    toPairs({ ...values, thermal_value: halved, thermal_source: "Desk test value for recomputation, D" }),
    { slug },
  );
  expect(ok.status).toBe(200);
  const after = await Detail.findOne({ where: { slug: "basement-icf-wall" } });
  // Halving the foam's conductivity doubles its R, so the wall's projection rises.
  expect(after!.rValueRsi!).toBeGreaterThan(before!.rValueRsi!);
  expect(
    await AuditEvent.findOne({ where: { action: "material.updated", subjectId: slug, actorId: ids.editor } }),
  ).not.toBeNull();
  const { materialLibrary } = await import("~/catalogue/materials.server");
  expect((await materialLibrary()).get(slug)!.thermal.conductivity_w_mk).toBe(Number(halved));
});
