// A train on a phone (a saved build's, or the planner's answer): the same items and joints as
// the drawing, as a list read top (sky) to bottom (sensor), so nothing needs sideways scrolling.
import { genderSign, type TrainJoint, type TrainRole } from "@/lib/builds/train";
import type { Gender } from "@/lib/solver";
import { interfaceHue, interfaceLabel } from "@/lib/interfaces";
import { formatLength, type LengthUnit } from "@/lib/units";

type ListItem = { key: string; name: string; role: TrainRole; owned?: boolean; reversed: boolean; lengthMm: number; startMm: number | null };
/** A joint the planner could not find has no interface. */
type ListJoint = Omit<TrainJoint, "code"> & { code: string | null; skyGender: Gender | null };

const ROLE_WORDS = { telescope: "Telescope", optics: "Optics", connector: "Connector", station: "Device", camera: "Camera" } as const;

export function TrainList({ train, unit = "mm", className = "" }: { train: { items: ListItem[]; joints: ListJoint[] }; unit?: LengthUnit; className?: string }) {
  return (
    <ol aria-label="The train, sky to sensor" className={`space-y-0 ${className}`}>
      {train.items.map((item, i) => {
        const joint = train.joints[i];
        return (
          <li key={item.key} data-testid="train-list-item">
            <div className={`rounded-md border px-3 py-2 ${item.role === "station" ? "border-line bg-station" : item.role === "optics" || item.role === "telescope" ? "border-glass/50 bg-glass/5" : "border-line bg-surface"}`}>
              <p className="text-xs text-muted">{ROLE_WORDS[item.role]}{item.owned ? " · owned" : ""}{item.reversed ? " · turned round" : ""}</p>
              <p className="font-medium text-ink">{item.name}</p>
              {item.startMm !== null && item.role !== "optics" ? <p className="num text-xs text-muted">{formatLength(item.lengthMm, unit)}, from {formatLength(item.startMm, unit)} behind the optics</p> : null}
            </div>
            {joint && i < train.items.length - 1 && joint.code === null ? (
              <p className="py-1.5 pl-4 text-xs font-semibold text-bad">✕ no joint found</p>
            ) : joint && joint.code !== null && i < train.items.length - 1 ? (
              <p className="flex items-center gap-2 py-1.5 pl-4 text-xs text-brass-ink">
                <span aria-hidden className="inline-block h-4 w-1 rounded-sm night:!bg-brass" style={{ background: `hsl(${interfaceHue(joint.code)} 55% 45%)` }} />
                <span className="code">{interfaceLabel(joint.code)}</span>
                <span className="text-muted">{genderSign(joint.skyGender)}→{genderSign(joint.sensorGender)}</span>
              </p>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}
