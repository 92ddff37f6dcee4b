import "server-only";
import Stripe from "stripe";
import { AppError } from "@/lib/errors";

// The Stripe SDK, pointed at the local fake by STRIPE_API_HOST/PORT/PROTOCOL (npm start and
// npm test set them) or at Stripe itself when they are unset.
const globalForStripe = globalThis as unknown as { trainyardStripe?: Stripe };

export function getStripe(): Stripe {
  if (globalForStripe.trainyardStripe) return globalForStripe.trainyardStripe;
  const key = process.env.STRIPE_SECRET_KEY;
  if (!key) throw new AppError("unavailable", "Payments are not set up on this server (STRIPE_SECRET_KEY is missing).");
  const host = process.env.STRIPE_API_HOST;
  globalForStripe.trainyardStripe = new Stripe(key, {
    ...(host ? { host, port: process.env.STRIPE_API_PORT ?? undefined, protocol: process.env.STRIPE_API_PROTOCOL === "http" ? "http" : "https" } : {}),
    maxNetworkRetries: 2,
    timeout: 20_000,
    telemetry: false,
  });
  return globalForStripe.trainyardStripe;
}

export function webhookSecret(): string {
  const secret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new AppError("unavailable", "Payments are not set up on this server (STRIPE_WEBHOOK_SECRET is missing).");
  return secret;
}

/** Checkout Sessions must stay open at least 30 minutes; the reservation holds that long at most. */
export const CHECKOUT_MINUTES = 30;
