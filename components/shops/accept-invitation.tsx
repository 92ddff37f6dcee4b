"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/field";
import { fetchJson } from "@/components/api-client";

export function AcceptInvitation({ id, shopName }: { id: string; shopName: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <div className="space-y-3">
      <p className="text-text">You will be staff of {shopName}: you can edit its stock and answer its quotes.</p>
      {error ? <FormMessage>{error}</FormMessage> : null}
      <Button disabled={busy} onClick={async () => {
        setBusy(true); setError(null);
        try { await fetchJson(`/api/v1/shops/invitations/${id}/accept`, { method: "POST" }); router.push("/shop"); router.refresh(); }
        catch (err) { setError((err as Error).message); setBusy(false); }
      }}>Accept and open the shop</Button>
    </div>
  );
}
