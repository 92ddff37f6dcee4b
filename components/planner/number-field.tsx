"use client";
import { useEffect, useId, useState } from "react";
import { inputClass } from "@/components/ui/field";

/**
 * A decimal input that keeps what is typed and reports only numbers inside [min, max];
 * empty reports null. Shows why a value is refused.
 */
export function NumberField({ label, value, onChange, min, max, unit, placeholder, className = "" }: {
  label: string; value: number | null; onChange: (v: number | null) => void; min: number; max: number;
  unit?: string; placeholder?: string; className?: string;
}) {
  const id = useId();
  const [text, setText] = useState(value === null ? "" : String(value));
  // Follow outside changes (a preset chosen, a reset) without fighting the typist.
  useEffect(() => {
    setText((t) => (t.trim() !== "" && Number(t) === value) || (t.trim() === "" && value === null) ? t : value === null ? "" : String(value));
  }, [value]);
  const n = Number(text.replace(",", "."));
  const invalid = text.trim() !== "" && (!Number.isFinite(n) || n < min || n > max);
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block text-xs font-medium text-muted">{label}</label>
      <div className="relative">
        <input id={id} inputMode="decimal" type="text" value={text} placeholder={placeholder}
          aria-invalid={invalid || undefined} aria-describedby={invalid ? `${id}-err` : undefined}
          className={`${inputClass} num ${unit ? "pr-10" : ""}`}
          onChange={(e) => {
            const t = e.target.value;
            setText(t);
            const v = Number(t.replace(",", "."));
            if (t.trim() === "") onChange(null);
            else if (Number.isFinite(v) && v >= min && v <= max) onChange(v);
          }} />
        {unit ? <span aria-hidden className="pointer-events-none absolute right-3 top-1/2 -translate-y-1/2 text-xs text-muted">{unit}</span> : null}
      </div>
      {invalid ? <p id={`${id}-err`} role="alert" className="mt-1 text-xs text-bad">From {min} to {max}{unit ? ` ${unit}` : ""}.</p> : null}
    </div>
  );
}
