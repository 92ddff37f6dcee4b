"use client";
import { useState } from "react";
import { callApi } from "@/components/api-client";
import { Button } from "@/components/ui/button";

/** "I own this": adds one to the signed-in user's gear. */
export function OwnButton({ partId, initialQuantity }: { partId: string; initialQuantity: number }) {
  const [quantity, setQuantity] = useState(initialQuantity);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function change(next: number) {
    setBusy(true); setError(null);
    const res = await callApi("PUT", "/api/v1/gear", { partId, quantity: next });
    setBusy(false);
    if (!res.ok) { setError(res.message); return; }
    setQuantity(next);
  }
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      {quantity > 0 ? (
        <>
          <span className="text-ok">You own {quantity}.</span>
          <Button variant="secondary" disabled={busy} onClick={() => change(quantity + 1)}>Own one more</Button>
          <Button variant="ghost" disabled={busy} onClick={() => change(0)}>Remove from my gear</Button>
        </>
      ) : <Button variant="secondary" disabled={busy} onClick={() => change(1)}>I own this</Button>}
      {error ? <span role="alert" className="text-bad">{error}</span> : null}
    </div>
  );
}
