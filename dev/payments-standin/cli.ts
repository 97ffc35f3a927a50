import { startPaymentsStandin } from "./server";

// Runs the stand-in on its own: `npx tsx dev/payments-standin/cli.ts`.
const webhookUrl = process.env.PAYMENTS_WEBHOOK_URL;
const webhookSecret = process.env.PAYMENTS_WEBHOOK_SECRET;
const missing = [
  ...(webhookUrl
    ? []
    : ["PAYMENTS_WEBHOOK_URL (where to POST events, e.g. http://127.0.0.1:3000/api/payments/webhook)"]),
  ...(webhookSecret
    ? []
    : ["PAYMENTS_WEBHOOK_SECRET (the signing secret the app verifies with, e.g. whsec_standin_local)"]),
];
const port = Number(process.env.PAYMENTS_STANDIN_PORT ?? 12111);
if (!Number.isInteger(port) || port < 0 || port > 65535) missing.push("PAYMENTS_STANDIN_PORT must be a port number");

if (!webhookUrl || !webhookSecret || missing.length > 0) {
  console.error(`payments stand-in cannot start; set:\n${missing.map((line) => `  ${line}`).join("\n")}`);
  process.exit(1);
}

const standin = await startPaymentsStandin({
  port,
  host: "127.0.0.1",
  webhookUrl,
  webhookSecret,
  publicUrl: process.env.PAYMENTS_STANDIN_PUBLIC_URL || undefined,
  stateFile: process.env.PAYMENTS_STANDIN_STATE_FILE || undefined,
});
console.log(`payments stand-in listening on ${standin.url}, sending webhooks to ${webhookUrl}`);

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.once(signal, () => {
    void standin.close().then(() => process.exit(0));
  });
}
