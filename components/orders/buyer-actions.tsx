"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi } from "@/components/api-client";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/field";

/** Pay (reserve + open the payment page), end an open payment, or withdraw the request. */
export function BuyerActions({ id, canPay, paymentOpen, canCancel, total }: { id: string; canPay: boolean; paymentOpen: boolean; canCancel: boolean; total: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function run(kind: string, method: "POST" | "DELETE", path: string, body?: unknown) {
    setBusy(kind); setError(null);
    const res = await callApi<{ url?: string }>(method, path, body);
    if (!res.ok) { setBusy(null); setError(res.message); router.refresh(); return; }
    if (kind === "pay" && res.data.url) { window.location.assign(res.data.url); return; }
    setBusy(null);
    router.refresh();
  }

  return (
    <div className="space-y-3">
      {error ? <FormMessage>{error}</FormMessage> : null}
      <div className="flex flex-wrap gap-2">
        {canPay ? (
          <Button onClick={() => run("pay", "POST", `/api/v1/quotes/${id}/checkout`)} disabled={!!busy}>
            {busy === "pay" ? "Reserving the parts…" : paymentOpen ? "Continue to payment" : `Accept and pay ${total}`}
          </Button>
        ) : null}
        {paymentOpen ? <Button variant="secondary" onClick={() => run("end", "DELETE", `/api/v1/quotes/${id}/checkout`)} disabled={!!busy}>{busy === "end" ? "Ending…" : "End this payment"}</Button> : null}
        {canCancel ? (
          <Button variant="ghost" disabled={!!busy} onClick={() => { if (window.confirm("Withdraw this quote request? The shop will be told.")) void run("cancel", "POST", `/api/v1/quotes/${id}/cancel`, {}); }}>
            Withdraw the request
          </Button>
        ) : null}
      </div>
      {canPay ? <p className="text-xs text-muted">Accepting holds these parts on the shop&rsquo;s shelf for 30 minutes while you pay; if you do not finish, they go back.</p> : null}
    </div>
  );
}
