// Plain text first (what many mail clients and every screen reader show), with a simple HTML twin.
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

const SIGN_OFF = "— Dryside, reviewed building-envelope details";

function escapeHtml(value: string): string {
  return value.replaceAll("&", "&amp;").replaceAll("<", "&lt;").replaceAll(">", "&gt;").replaceAll('"', "&quot;");
}

function html(paragraphs: string[], link?: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("\n");
  const button = link
    ? `<p><a href="${escapeHtml(link.href)}" style="display:inline-block;padding:8px 16px;background:#b0761a;color:#fff;text-decoration:none;border-radius:4px">${escapeHtml(link.label)}</a></p>\n<p style="font-size:13px;color:#5d5b55">Or paste this address into your browser: ${escapeHtml(link.href)}</p>`
    : "";
  return `<!doctype html><html><body style="font-family:sans-serif;color:#2c2c2a;background:#f7f2e8;padding:24px">\n${body}\n${button}\n<p style="color:#5d5b55">${escapeHtml(SIGN_OFF)}</p></body></html>`;
}

function text(paragraphs: string[], link?: string): string {
  return `${[...paragraphs, ...(link ? [link] : []), SIGN_OFF].join("\n\n")}\n`;
}

export function verifyEmailMail({ displayName, link }: { displayName: string; link: string }): MailContent {
  const lines = [
    `Hello ${displayName},`,
    "Confirm this address to finish setting up your Dryside account. The link works once and expires in 24 hours.",
    "If you did not sign up, ignore this message; no account becomes active without it.",
  ];
  return {
    subject: "Confirm your e-mail for Dryside",
    text: text(lines, link),
    html: html(lines, { href: link, label: "Confirm my e-mail" }),
  };
}

/** Sent when someone signs up with an address that already has an account, so sign-up never reveals it. */
export function alreadyRegisteredMail({
  displayName,
  signInLink,
  resetLink,
}: {
  displayName: string;
  signInLink: string;
  resetLink: string;
}): MailContent {
  const lines = [
    `Hello ${displayName},`,
    "Someone tried to create a Dryside account with this address, which already has one.",
    `If it was you, sign in at ${signInLink} or choose a new password at ${resetLink}. If not, you can ignore this message.`,
  ];
  return { subject: "You already have a Dryside account", text: text(lines), html: html(lines) };
}

export function resetPasswordMail({ displayName, link }: { displayName: string; link: string }): MailContent {
  const lines = [
    `Hello ${displayName},`,
    "Use this link to choose a new Dryside password. It works once and expires in one hour; choosing a new password signs out every other browser.",
    "If you did not ask for this, ignore this message; your password stays as it is.",
  ];
  return {
    subject: "Choose a new Dryside password",
    text: text(lines, link),
    html: html(lines, { href: link, label: "Choose a new password" }),
  };
}

export function revisionAlertMail({
  displayName,
  detailTitle,
  revision,
  changeNote,
  link,
}: {
  displayName: string;
  detailTitle: string;
  revision: number;
  changeNote: string;
  link: string;
}): MailContent {
  const lines = [
    `Hello ${displayName},`,
    `A detail you saved was revised: “${detailTitle}”, revision ${revision}.`,
    `What changed: ${changeNote}`,
    "Check the revision against your drawings before you build from it, and confirm it with the code adopted where you build.",
  ];
  return {
    subject: `Revised: ${detailTitle} (revision ${revision})`,
    text: text(lines, link),
    html: html(lines, { href: link, label: "Read the revision" }),
  };
}

export function receiptMail({
  displayName,
  item,
  amount,
  date,
  reference,
}: {
  displayName: string;
  item: string;
  amount: string;
  date: string;
  reference: string;
}): MailContent {
  const lines = [
    `Hello ${displayName},`,
    `Thank you. This is your receipt for ${item}.`,
    `Amount: ${amount}. Date: ${date}. Reference: ${reference}.`,
    "Your downloads are on your account page.",
  ];
  return { subject: `Your Dryside receipt — ${item}`, text: text(lines), html: html(lines) };
}
