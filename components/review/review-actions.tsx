"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi } from "@/components/api-client";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";

export function ReviewActions({ id }: { id: string }) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function decide(decision: "approve" | "reject") {
    setBusy(true); setError(null);
    const res = await callApi("POST", `/api/v1/submissions/${id}/review`, { decision, reason: reason || undefined });
    setBusy(false);
    if (!res.ok) { setError(res.fields?.reason?.[0] ?? res.message); return; }
    router.refresh();
  }
  return (
    <div className="space-y-2">
      <label className="block text-sm"><span className="sr-only">Reason or note</span>
        <textarea rows={2} className={inputClass} placeholder="Note to the submitter (required to reject)" value={reason} onChange={(e) => setReason(e.target.value)} />
      </label>
      {error ? <p role="alert" className="text-sm text-bad">{error}</p> : null}
      <div className="flex gap-2">
        <Button disabled={busy} onClick={() => decide("approve")}>Approve</Button>
        <Button disabled={busy} variant="danger" onClick={() => decide("reject")}>Reject</Button>
      </div>
    </div>
  );
}
