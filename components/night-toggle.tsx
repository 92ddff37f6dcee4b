"use client";
import { useState } from "react";

/** Dim red on black for use at the telescope; remembered in a cookie for a year. */
// Not next-themes (+1.1 KB gzip on every page, measured): it keeps the choice in localStorage, set by an inline script before paint, so the server cannot render this button's state; the cookie lets it.
export function NightToggle({ initial }: { initial: boolean }) {
  const [night, setNight] = useState(initial);
  function toggle() {
    const next = !night;
    setNight(next);
    document.documentElement.dataset.theme = next ? "night" : "day";
    // biome-ignore lint/suspicious/noDocumentCookie: the Cookie Store API is missing from some browsers we serve; one plain cookie
    document.cookie = `ty-theme=${next ? "night" : "day"}; path=/; max-age=31536000; samesite=lax`;
  }
  return (
    <button type="button" onClick={toggle} aria-pressed={night}
      title={night ? "Back to day colours" : "Dim red on black, to keep your eyes dark-adapted"}
      className="inline-flex items-center gap-2 rounded-full border border-white/20 px-3 py-1.5 text-sm text-header-text hover:border-brass night:border-line">
      <svg aria-hidden width="14" height="14" viewBox="0 0 16 16" className="shrink-0">
        <circle cx="8" cy="8" r="6.5" fill="none" stroke="currentColor" strokeWidth="1.5" />
        <path d="M8 1.5a6.5 6.5 0 0 1 0 13z" fill="currentColor" />
      </svg>
      <span>{night ? "Night on" : "Night"}</span>
    </button>
  );
}
