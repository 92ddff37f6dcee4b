"use client";
// Our own page for an unexpected failure inside the layout: says so plainly, offers a retry,
// and keeps the header, so nothing the visitor was doing elsewhere is lost.
import { useEffect } from "react";
import { Button, ButtonLink } from "@/components/ui/button";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => { console.error(error); }, [error]);
  return (
    <div role="alert" className="mx-auto max-w-xl py-10">
      <p className="text-[11px] font-medium uppercase tracking-[0.2em] text-bad">Something went wrong</p>
      <h1 className="mt-2 text-2xl font-semibold tracking-tight text-ink sm:text-3xl">This page could not be shown</h1>
      <p className="mt-3 text-text">Trainyard hit a problem on its side. Nothing you saved is lost; trying again usually works.</p>
      {error.digest ? <p className="mt-2 text-sm text-muted">Reference for a bug report: <span className="code">{error.digest}</span></p> : null}
      <div className="mt-6 flex flex-wrap gap-2">
        <Button onClick={reset}>Try again</Button>
        <ButtonLink href="/" variant="secondary">Home</ButtonLink>
      </div>
    </div>
  );
}
