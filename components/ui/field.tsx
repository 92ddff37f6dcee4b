import { forwardRef, type ComponentProps, type ReactNode } from "react";

export const inputClass = "w-full rounded-md border border-line bg-surface px-3 py-2 text-sm text-text placeholder:text-muted focus:border-brass focus:outline-none aria-[invalid=true]:border-bad";

export function Field({ label, error, hint, children, htmlFor }: { label: string; error?: string; hint?: ReactNode; children: ReactNode; htmlFor: string }) {
  return (
    <div className="space-y-1.5">
      <label htmlFor={htmlFor} className="block text-sm font-medium text-text">{label}</label>
      {children}
      {error ? <p id={`${htmlFor}-error`} role="alert" className="text-sm text-bad">{error}</p> : hint ? <p className="text-xs text-muted">{hint}</p> : null}
    </div>
  );
}

export const Input = forwardRef<HTMLInputElement, ComponentProps<"input"> & { invalid?: boolean }>(function Input({ invalid, className = "", ...props }, ref) {
  return <input ref={ref} aria-invalid={invalid || undefined} className={`${inputClass} ${className}`} {...props} />;
});

export function FormMessage({ tone = "bad", children }: { tone?: "bad" | "ok" | "info"; children: ReactNode }) {
  const color = tone === "bad" ? "border-bad/40 bg-bad/5 text-bad" : tone === "ok" ? "border-ok/40 bg-ok/5 text-ok" : "border-line bg-sunken text-text";
  return <div role={tone === "bad" ? "alert" : "status"} className={`rounded-md border px-3 py-2 text-sm ${color}`}>{children}</div>;
}
