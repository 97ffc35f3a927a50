import Stripe from "stripe";
import { env } from "~/config/env.server";

// One SDK client per process. Host, port and protocol come from the environment so the same code talks
// to the local stand-in (dev, tests) or the hosted service (leave STRIPE_API_HOST unset).
const globalForStripe = globalThis as typeof globalThis & { __drysideStripe?: Stripe };

export function stripe(): Stripe {
  if (!globalForStripe.__drysideStripe) {
    const e = env();
    globalForStripe.__drysideStripe = new Stripe(e.STRIPE_SECRET_KEY, {
      ...(e.STRIPE_API_HOST ? { host: e.STRIPE_API_HOST } : {}),
      ...(e.STRIPE_API_PORT ? { port: e.STRIPE_API_PORT } : {}),
      protocol: e.STRIPE_API_PROTOCOL,
      maxNetworkRetries: 0,
      telemetry: false,
    });
  }
  return globalForStripe.__drysideStripe;
}

/** Forgets the client (tests that point the app at a fresh stand-in). */
export function resetStripeClient(): void {
  globalForStripe.__drysideStripe = undefined;
}
