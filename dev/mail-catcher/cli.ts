// npm start runs this when present: MAIL_CATCHER_PORT and MAIL_OUTBOX_DIR come from scripts/start.sh.
import { startMailCatcher } from "./server.ts";

const port = Number(process.env.MAIL_CATCHER_PORT ?? 2525);
const outboxDir = process.env.MAIL_OUTBOX_DIR ?? ".data/outbox";

const catcher = await startMailCatcher({ port, outboxDir });
console.log(`mail catcher listening on 127.0.0.1:${catcher.port}, filing messages in ${outboxDir}`);

// Ctrl-C reaches us twice (the terminal's SIGINT and start.sh's SIGTERM): close once.
let closing = false;
for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => {
    if (closing) return;
    closing = true;
    void catcher.close().finally(() => process.exit(0));
  });
}
