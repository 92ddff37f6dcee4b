"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi } from "@/components/api-client";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";

/** Paid orders: mark shipped with tracking text, or refund in full. Open quotes: decline. */
export function ShopOrderActions({ id, canShip, canRefund, canDecline, total }: { id: string; canShip: boolean; canRefund: boolean; canDecline: boolean; total: string }) {
  const router = useRouter();
  const [tracking, setTracking] = useState("");
  const [busy, setBusy] = useState<string | null>(null);
  const [message, setMessage] = useState<{ tone: "bad" | "ok"; text: string } | null>(null);
  const [fields, setFields] = useState<Record<string, string[]>>({});

  async function run(kind: string, path: string, body: unknown, done: string) {
    setBusy(kind); setMessage(null); setFields({});
    const res = await callApi("POST", path, body);
    setBusy(null);
    if (!res.ok) { setMessage({ tone: "bad", text: res.message }); setFields(res.fields ?? {}); return; }
    setMessage({ tone: "ok", text: done });
    router.refresh();
  }

  return (
    <div className="space-y-4">
      {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
      {canShip ? (
        <form className="space-y-3" noValidate onSubmit={(e) => { e.preventDefault(); void run("ship", `/api/v1/orders/${id}/ship`, { tracking }, "Marked shipped; the buyer has an e-mail with the tracking."); }}>
          <Field label="Tracking" htmlFor="ship-tracking" error={fields.tracking?.[0]} hint="Carrier and number, or how it travels (“collected in person”).">
            <Input id="ship-tracking" value={tracking} maxLength={300} invalid={!!fields.tracking} onChange={(e) => setTracking(e.target.value)} />
          </Field>
          <Button type="submit" disabled={!!busy}>{busy === "ship" ? "Saving…" : "Mark shipped"}</Button>
        </form>
      ) : null}
      {canRefund ? (
        <div className="border-t border-line pt-3">
          <Button variant="danger" disabled={!!busy} onClick={() => { if (window.confirm(`Refund ${total} to the buyer's card? This cannot be undone.`)) void run("refund", `/api/v1/orders/${id}/refund`, {}, "Refunded; the buyer has an e-mail."); }}>
            {busy === "refund" ? "Refunding…" : `Refund ${total}`}
          </Button>
          <p className="mt-1 text-xs text-muted">The whole amount goes back through the payment provider. The parts are not put back on the shelf count: adjust your inventory when they return.</p>
        </div>
      ) : null}
      {canDecline ? (
        <Button variant="ghost" disabled={!!busy} onClick={() => { const reason = window.prompt("Decline this request? Tell the buyer why (optional):"); if (reason !== null) void run("decline", `/api/v1/quotes/${id}/cancel`, { reason: reason.trim() || undefined }, "Declined; the buyer has been told."); }}>
          Decline the request
        </Button>
      ) : null}
    </div>
  );
}
