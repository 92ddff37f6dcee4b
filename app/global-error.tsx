"use client";
// When even the root layout fails: a bare page of our own, in plain HTML and inline styles.
export default function GlobalError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "system-ui, sans-serif", background: "#f4f2ec", color: "#1b2236", padding: "3rem 1.5rem" }}>
        <main style={{ maxWidth: "36rem", margin: "0 auto" }}>
          <h1 style={{ fontSize: "1.75rem" }}>Trainyard could not load this page</h1>
          <p>Something failed on our side. Nothing you saved is lost.</p>
          <button type="button" onClick={reset} style={{ marginTop: "1rem", padding: "0.5rem 1rem", background: "#0d1326", color: "#f4f2ec", border: 0, borderRadius: 6 }}>Try again</button>
        </main>
      </body>
    </html>
  );
}
