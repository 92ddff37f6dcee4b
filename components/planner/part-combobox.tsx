"use client";
// Search-as-you-type over the catalog, as an ARIA 1.2 combobox: arrows move, Enter picks,
// Escape closes (and clears when already closed).
// Hand-written, not Downshift's useCombobox: that adds 8.1 KB gzip to the planner's first-load JS (measured), already near its 250 KB budget.
import { keepPreviousData, useQuery, useQueryClient } from "@tanstack/react-query";
import { useId, useMemo, useRef, useState } from "react";
import { useDebounce } from "use-debounce";
import type { ApiPart } from "@/lib/catalog/part-json";
import { KIND_LABELS } from "@/lib/format";
import { interfaceLabel } from "@/lib/interfaces";
import { formatMm } from "@/lib/units";
import { inputClass } from "@/components/ui/field";
import { searchParts } from "./api";

type Props = {
  label: string;
  kinds: readonly string[];
  placeholder?: string;
  /** Keep only some of the answers (e.g. correctors among optics). */
  accept?: (p: ApiPart) => boolean;
  onPick: (p: ApiPart) => void;
  autoFocus?: boolean;
  hint?: string;
  /** A mark for some answers (e.g. "joins your telescope"); marked answers are listed first. */
  mark?: (p: ApiPart) => { text: string; first: boolean } | null;
};

export function roleOf(p: ApiPart): string {
  const role = (p as { opticsRole?: string }).opticsRole;
  return role ? role[0].toUpperCase() + role.slice(1) : KIND_LABELS[p.kind] ?? p.kind;
}

export function facesText(p: Pick<ApiPart, "front" | "rear">): string {
  const face = (f: ApiPart["front"]) => f ? `${interfaceLabel(f.interface)} ${f.gender === "male" ? "♂" : "♀"}` : "—";
  return `${face(p.front)} → ${face(p.rear)}`;
}

/** The first text field or select that follows `anchor` in the page (outside it), if any. */
function focusFieldAfter(anchor: Element) {
  const fields = document.querySelectorAll<HTMLElement>("input:not([type=hidden]):not([disabled]), select:not([disabled]), textarea:not([disabled])");
  for (const f of fields) {
    if (!anchor.contains(f) && anchor.compareDocumentPosition(f) & Node.DOCUMENT_POSITION_FOLLOWING && f.offsetParent !== null) { f.focus(); return; }
  }
}

export function PartCombobox({ label, kinds, placeholder, accept, onPick, autoFocus, hint, mark }: Props) {
  const id = useId();
  const listId = `${id}-list`;
  const queryClient = useQueryClient();
  const [text, setText] = useState("");
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(-1);
  const inputRef = useRef<HTMLInputElement>(null);
  const [q] = useDebounce(text, 220);

  const query = useQuery({
    queryKey: ["parts-search", kinds.join("+"), q],
    queryFn: ({ signal }) => searchParts(kinds, q, signal),
    enabled: open,
    placeholderData: keepPreviousData,
    staleTime: 60_000,
  });
  const options = useMemo(() => {
    const all = query.data ?? [];
    const kept = accept ? all.filter(accept) : all;
    // Stable: marked answers first, each group in the catalog's own order.
    const sorted = mark ? [...kept.filter((p) => mark(p)?.first), ...kept.filter((p) => !mark(p)?.first)] : kept;
    return sorted.slice(0, 40);
  }, [query.data, accept, mark]);
  const activeIndex = Math.min(active, options.length - 1);

  function pick(p: ApiPart) {
    const stop = inputRef.current?.closest("li") ?? inputRef.current;
    queryClient.setQueryData(["part", p.slug], p);
    onPick(p);
    setText("");
    setOpen(false);
    setActive(-1);
    // Once the choice has rendered, carry on to the next field of the form.
    if (stop) requestAnimationFrame(() => requestAnimationFrame(() => focusFieldAfter(stop)));
  }

  function onKeyDown(e: React.KeyboardEvent<HTMLInputElement>) {
    if (e.key === "ArrowDown" || e.key === "ArrowUp") {
      e.preventDefault();
      if (!open) { setOpen(true); return; }
      const n = options.length;
      if (n) setActive(activeIndex < 0 ? (e.key === "ArrowDown" ? 0 : n - 1) : (activeIndex + (e.key === "ArrowDown" ? 1 : n - 1)) % n);
    } else if (e.key === "Enter") {
      if (open && activeIndex < 0 && text.trim() && (q !== text || query.isFetching)) {
        // The list on screen is for an older text: pick the best match for what was typed.
        e.preventDefault();
        void queryClient.fetchQuery({ queryKey: ["parts-search", kinds.join("+"), text], queryFn: ({ signal }) => searchParts(kinds, text, signal), staleTime: 60_000 })
          .then((all) => { const best = (accept ? all.filter(accept) : all)[0]; if (best) pick(best); }, () => undefined);
        return;
      }
      const chosen = options[activeIndex] ?? (text.trim() ? options[0] : undefined);
      if (open && chosen) { e.preventDefault(); pick(chosen); }
    } else if (e.key === "Escape") {
      if (open) { e.preventDefault(); setOpen(false); } else setText("");
    } else if (e.key === "Home" && open && options.length) {
      setActive(0);
    } else if (e.key === "End" && open && options.length) {
      setActive(options.length - 1);
    }
  }

  const optionId = (i: number) => `${id}-opt-${i}`;
  const waiting = query.isFetching && (q !== text || !query.data);

  return (
    <div className="relative">
      <label htmlFor={`${id}-input`} className="sr-only">{label}</label>
      <input
        ref={inputRef}
        id={`${id}-input`}
        role="combobox"
        aria-expanded={open}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={open && activeIndex >= 0 && options[activeIndex] ? optionId(activeIndex) : undefined}
        aria-describedby={hint ? `${id}-hint` : undefined}
        autoComplete="off"
        // biome-ignore lint/a11y/noAutofocus: only when the caller opens the picker on purpose (the "change" button), so focus follows the press
        autoFocus={autoFocus}
        className={inputClass}
        placeholder={placeholder ?? "Type a maker, model or thread…"}
        value={text}
        onChange={(e) => { setText(e.target.value); setOpen(true); setActive(-1); }}
        onClick={() => setOpen(true)}
        // Close after a click on an option has landed, unless the focus came back meanwhile.
        onBlur={() => setTimeout(() => { if (document.activeElement !== inputRef.current) setOpen(false); }, 120)}
        onKeyDown={onKeyDown}
      />
      {hint ? <p id={`${id}-hint`} className="mt-1 text-xs text-muted">{hint}</p> : null}
      {open ? (
        <div className="absolute left-0 right-0 z-30 mt-1 lg:right-auto lg:w-[26rem] overflow-hidden rounded-md border border-line bg-surface shadow-lg shadow-black/10">
          {/* biome-ignore lint/a11y/noNoninteractiveElementToInteractiveRole: the ARIA 1.2 combobox pattern: a ul listbox driven from the input */}
          <ul id={listId} role="listbox" aria-label={label} tabIndex={-1} className="max-h-72 overflow-y-auto py-1">
            {options.map((p, i) => (
              // biome-ignore lint/a11y/useFocusableInteractive: the active option is announced through aria-activedescendant; focus stays in the input
              <li
                key={p.slug}
                id={optionId(i)}
                // biome-ignore lint/a11y/noNoninteractiveElementToInteractiveRole: an option of the listbox above
                role="option"
                aria-selected={i === activeIndex}
                onMouseDown={(e) => { e.preventDefault(); pick(p); }}
                onMouseEnter={() => setActive(i)}
                className={`cursor-pointer px-3 py-2 text-sm ${i === activeIndex ? "bg-sunken shadow-[inset_3px_0_0_var(--c-brass)]" : ""}`}
              >
                <span className="block font-medium text-ink">{p.name}</span>
                {mark?.(p) ? <span data-testid="option-mark" className={`mt-0.5 block text-xs font-medium ${mark(p)!.first ? "text-ok" : "text-muted"}`}>{mark(p)!.first ? "✓ " : "✕ "}{mark(p)!.text}</span> : null}
                <span className="mt-0.5 flex flex-wrap gap-x-3 text-xs text-muted">
                  <span>{roleOf(p)}</span>
                  <span className="code">{facesText(p)}</span>
                  {p.kind !== "optics" || p.lengthMm ? <span className="num">{formatMm(p.lengthMm)}{p.adjustMm ? ` +${p.adjustMm}` : ""}</span> : null}
                </span>
              </li>
            ))}
          </ul>
          <div role="status" aria-live="polite" className="border-t border-line/70 px-3 py-1.5 text-xs text-muted empty:hidden">
            {query.isError ? `The catalog did not answer: ${(query.error as Error).message}`
              : waiting ? "Searching the catalog…"
                : options.length === 0 ? (text ? `Nothing matches “${text}”.` : "No parts of this kind yet.")
                  : `${options.length} found${options.length === 40 ? " — type to narrow" : ""}`}
          </div>
        </div>
      ) : null}
    </div>
  );
}
