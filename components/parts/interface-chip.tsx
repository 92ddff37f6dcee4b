import { getInterface, interfaceHue, interfaceLabel } from "@/lib/interfaces";

/** An interface code with its family colour; the code is always written out. */
export function InterfaceChip({ code, gender }: { code: string; gender?: "male" | "female" }) {
  const spec = getInterface(code);
  const hue = interfaceHue(code);
  return (
    <span className="inline-flex items-center gap-1.5 whitespace-nowrap" title={spec ? `${spec.name}${gender ? `, ${gender}` : ""}` : code}>
      <span aria-hidden className="inline-block h-2.5 w-2.5 rounded-sm night:!bg-brass" style={{ background: `hsl(${hue} 55% 45%)` }} />
      <span className="code">{interfaceLabel(code)}</span>
      {gender ? <span className="text-xs text-muted">{gender === "male" ? "♂ male" : "♀ female"}</span> : null}
    </span>
  );
}
