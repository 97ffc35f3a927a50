import { createHmac } from "node:crypto";
import { nowSeconds } from "./objects";
import type { DeliveryAttempt, EventRecord } from "./store";

/**
 * The signature header of the real service: `t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<body>">`,
 * keyed with the endpoint secret. The SDK's `webhooks.constructEvent` verifies exactly this.
 */
export function signatureHeader(payload: string, secret: string, timestamp = nowSeconds()): string {
  const signature = createHmac("sha256", secret).update(`${timestamp}.${payload}`).digest("hex");
  return `t=${timestamp},v1=${signature}`;
}

export type WebhookOptions = {
  url: string;
  secret: string;
  /** Waits before each retry of a failed delivery; its length bounds the retries. */
  retryDelaysMs?: number[];
  /** Per-attempt time limit for the receiver to answer. */
  timeoutMs?: number;
  onAttempt?: () => void;
};

/**
 * Sends events one at a time, in the order they were created, each retried a bounded number of times
 * (the queue waits for a retrying event, so order holds). `close()` abandons what is still queued.
 */
export class WebhookSender {
  private tail: Promise<void> = Promise.resolve();
  private closed = false;
  private readonly inFlight = new Set<AbortController>();
  private readonly sleepers = new Set<() => void>();
  private readonly retryDelaysMs: number[];
  private readonly timeoutMs: number;

  constructor(private readonly options: WebhookOptions) {
    this.retryDelaysMs = options.retryDelaysMs ?? [200, 800, 2000];
    this.timeoutMs = options.timeoutMs ?? 5000;
  }

  /** Resolves once the event was delivered or its retries ran out. */
  enqueue(record: EventRecord): Promise<void> {
    this.tail = this.tail.then(() => this.deliverWithRetries(record));
    return this.tail;
  }

  /** One more delivery of an already sent event, same id and body, freshly signed; queued behind the rest. */
  redeliver(record: EventRecord): Promise<DeliveryAttempt> {
    const attempt = this.tail.then(() => this.attempt(record, true));
    this.tail = attempt.then(() => undefined);
    return attempt;
  }

  close(): void {
    this.closed = true;
    for (const controller of this.inFlight) controller.abort();
    for (const wake of this.sleepers) wake();
  }

  private async deliverWithRetries(record: EventRecord): Promise<void> {
    for (let retry = 0; !this.closed; retry++) {
      const attempt = await this.attempt(record, false);
      if (attempt.error === null) return;
      const delay = this.retryDelaysMs[retry];
      if (delay === undefined) return;
      await this.sleep(delay);
    }
  }

  private async attempt(record: EventRecord, redelivery: boolean): Promise<DeliveryAttempt> {
    const payload = JSON.stringify(record.event, null, 2);
    const controller = new AbortController();
    const timer = setTimeout(() => controller.abort(), this.timeoutMs);
    this.inFlight.add(controller);
    const attempt: DeliveryAttempt = {
      attempt: record.deliveries.length + 1,
      at: nowSeconds(),
      status: null,
      error: null,
      redelivery,
    };
    try {
      const response = await fetch(this.options.url, {
        method: "POST",
        headers: {
          "content-type": "application/json; charset=utf-8",
          "stripe-signature": signatureHeader(payload, this.options.secret),
          "user-agent": "dryside-payments-standin/1",
        },
        body: payload,
        signal: controller.signal,
      });
      await response.arrayBuffer();
      attempt.status = response.status;
      // Any 2xx counts as received, as with the real service.
      if (response.status < 200 || response.status > 299) attempt.error = `receiver answered ${response.status}`;
    } catch (error) {
      attempt.error = describeFailure(error);
    } finally {
      clearTimeout(timer);
      this.inFlight.delete(controller);
    }
    record.deliveries.push(attempt);
    // The event itself stays untouched, so every delivery of it carries the same body.
    if (attempt.error === null) record.delivered = true;
    this.options.onAttempt?.();
    return attempt;
  }

  private sleep(ms: number): Promise<void> {
    return new Promise((resolve) => {
      const wake = (): void => {
        clearTimeout(timer);
        this.sleepers.delete(wake);
        resolve();
      };
      const timer = setTimeout(wake, ms);
      this.sleepers.add(wake);
    });
  }
}

/** fetch reports "fetch failed"; the cause (e.g. ECONNREFUSED) is what a developer needs to see. */
function describeFailure(error: unknown): string {
  if (!(error instanceof Error)) return String(error);
  return error.cause instanceof Error ? `${error.message}: ${error.cause.message}` : error.message;
}
