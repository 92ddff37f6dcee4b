// The saved train on a phone: the same items and joints as the drawing, as a list read top
// (sky) to bottom (sensor), so nothing needs sideways scrolling.
import { genderSign, type BuildTrain } from "@/lib/builds/train";
import { interfaceHue, interfaceLabel } from "@/lib/interfaces";
import { formatMm } from "@/lib/units";

const ROLE_WORDS = { telescope: "Telescope", optics: "Optics", connector: "Connector", station: "Device", camera: "Camera" } as const;

export function TrainList({ train, className = "" }: { train: BuildTrain; className?: string }) {
  return (
    <ol aria-label="The train, sky to sensor" className={`space-y-0 ${className}`}>
      {train.items.map((item, i) => {
        const joint = train.joints[i];
        return (
          <li key={item.key} data-testid="train-list-item">
            <div className={`rounded-md border px-3 py-2 ${item.role === "station" ? "border-line bg-station" : item.role === "optics" || item.role === "telescope" ? "border-glass/50 bg-glass/5" : "border-line bg-surface"}`}>
              <p className="text-xs text-muted">{ROLE_WORDS[item.role]}{item.owned ? " · owned" : ""}{item.reversed ? " · turned round" : ""}</p>
              <p className="font-medium text-ink">{item.name}</p>
              {item.startMm !== null && item.role !== "optics" ? <p className="num text-xs text-muted">{formatMm(item.lengthMm)}, from {formatMm(item.startMm)} behind the optics</p> : null}
            </div>
            {joint && i < train.items.length - 1 ? (
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
