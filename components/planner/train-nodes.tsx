"use client";
// React Flow pieces for the train: one node type per kind of item, one edge type per joint.
import { BaseEdge, EdgeLabelRenderer, Handle, Position, type Edge, type EdgeProps, type Node, type NodeProps } from "@xyflow/react";
import { interfaceHue, interfaceLabel } from "@/lib/interfaces";
import { formatLength, type LengthUnit } from "@/lib/units";
import { jointGenders, type TrainItem, type TrainJoint } from "./train-model";

export type TrainNodeData = { item: TrainItem; unit: LengthUnit; width: number; height: number; warning?: string };
export type TrainNode = Node<TrainNodeData>;
export type JointEdgeData = { joint: TrainJoint; labelDy: number };
export type JointEdge = Edge<JointEdgeData>;

const hidden = "!h-1 !w-1 !min-w-0 !min-h-0 !border-0 !bg-transparent";

function Ends() {
  return <>
    <Handle type="target" position={Position.Left} className={hidden} isConnectable={false} />
    <Handle type="source" position={Position.Right} className={hidden} isConnectable={false} />
  </>;
}

function Caption({ item, unit, lengthNote }: { item: TrainItem; unit: LengthUnit; lengthNote?: string }) {
  const maker = item.item?.maker;
  const model = item.item?.model ?? item.name;
  return (
    <div className="min-w-0 px-2 text-center leading-tight">
      {maker ? <p className="truncate text-[9.5px] uppercase tracking-wide text-muted">{maker}</p> : null}
      <p className="line-clamp-2 text-[11.5px] font-medium text-ink">{model}</p>
      <p className="num mt-0.5 text-[11px] text-text">{lengthNote ?? formatLength(item.lengthMm, unit)}{item.reversed ? " · reversed" : ""}{item.item?.owned ? " · owned" : ""}</p>
    </div>
  );
}

function box(data: TrainNodeData) {
  return { width: data.width, height: data.height, ...(data.warning ? { outline: "2px solid var(--c-warn)", outlineOffset: 3 } : {}) };
}

/** A warned item carries a small amber mark whose title says why. */
function Mark({ data }: { data: TrainNodeData }) {
  if (!data.warning) return null;
  return <span role="img" title={data.warning} aria-label={`Warning: ${data.warning}`} className="absolute -right-2 -top-3 z-10 rounded-full bg-warn px-1.5 text-[10px] font-bold leading-4 text-bg">▲</span>;
}

/** Every item's box: to scale, its hidden joint handles and warning mark; the shape and fill say what it is. */
function ItemBox({ data, kind, shape, style, children }: {
  data: TrainNodeData; kind: string; shape: string; style?: React.CSSProperties; children: React.ReactNode;
}) {
  return (
    <div data-testid="train-node" data-role={kind} style={{ ...box(data), ...style }} className={`relative flex items-center justify-center ${shape}`}>
      <Ends /><Mark data={data} />
      {children}
    </div>
  );
}

function OpticNode({ data }: NodeProps<TrainNode>) {
  const { item, unit } = data;
  const note = item.role === "telescope" ? "telescope" : item.lengthMm > 0 ? `${formatLength(item.lengthMm, unit)} body` : "back focus from here";
  return (
    <ItemBox data={data} kind={item.role} shape="rounded-l-[999px] rounded-r-md border-2 border-glass bg-[color-mix(in_srgb,var(--c-glass)_14%,var(--c-surface))] pl-4">
      <Caption item={item} unit={unit} lengthNote={note} />
    </ItemBox>
  );
}

const TEETH = "repeating-linear-gradient(90deg, var(--c-brass) 0 1.5px, transparent 1.5px 5px)";
/** Thread teeth along both edges of a connector. */
const THREADS = { backgroundImage: `${TEETH}, ${TEETH}`, backgroundSize: "100% 5px", backgroundRepeat: "no-repeat", backgroundPosition: "0 0, 0 100%" };

function ConnectorNode({ data }: NodeProps<TrainNode>) {
  return (
    <ItemBox data={data} kind="connector" style={THREADS} shape="rounded-[3px] border border-ink/60 bg-surface">
      <div className="rounded bg-surface/90 py-0.5"><Caption item={data.item} unit={data.unit} /></div>
    </ItemBox>
  );
}

function StationNode({ data }: NodeProps<TrainNode>) {
  return (
    <ItemBox data={data} kind="station" shape="rounded-md border-2 border-ink bg-station shadow-[inset_0_0_0_3px_var(--c-surface)]">
      <Caption item={data.item} unit={data.unit} />
    </ItemBox>
  );
}

function CameraNode({ data }: NodeProps<TrainNode>) {
  return (
    <ItemBox data={data} kind="camera" shape="rounded-l-sm rounded-r-[22px] border-2 border-ink bg-sunken pr-3">
      <Caption item={data.item} unit={data.unit} />
      <span aria-hidden className="absolute bottom-3 right-3 top-3 w-[3px] rounded bg-ok" title="sensor" />
    </ItemBox>
  );
}

export const nodeTypes = { optic: OpticNode, connector: ConnectorNode, station: StationNode, camera: CameraNode };

function JointEdgeView({ id, sourceX, sourceY, targetX, targetY, data }: EdgeProps<JointEdge>) {
  const joint = data?.joint;
  const midX = (sourceX + targetX) / 2, midY = (sourceY + targetY) / 2;
  const dy = data?.labelDy ?? 60;
  const broken = !joint?.code;
  const colour = broken ? "var(--c-bad)" : `hsl(${interfaceHue(joint!.code!)} 55% 42%)`;
  return (
    <>
      <BaseEdge id={id} path={`M${sourceX},${sourceY} L${targetX},${targetY}`}
        style={{ stroke: broken ? "var(--c-bad)" : "var(--c-brass)", strokeWidth: broken ? 2 : 6, strokeDasharray: broken ? "4 4" : undefined }} />
      {!broken ? <rect x={midX - 5} y={midY - 15} width={10} height={30} rx={2} fill="var(--c-brass)" stroke="var(--c-brass-ink)" /> : null}
      <path d={`M${midX},${midY + 16} L${midX},${midY + dy - 4}`} stroke="var(--c-line)" strokeWidth={1} fill="none" />
      <EdgeLabelRenderer>
        <div className="nodrag nopan pointer-events-none absolute whitespace-nowrap rounded border border-line bg-surface px-1.5 py-0.5 text-[11px] text-text"
          style={{ transform: `translate(-50%, 0) translate(${midX}px, ${midY + dy}px)` }}
          data-testid="train-joint">
          {broken ? <span className="font-medium text-bad">no joint found</span> : (
            <span className="inline-flex items-center gap-1">
              <span aria-hidden className="inline-block h-2 w-2 rounded-sm night:!bg-brass" style={{ background: colour }} />
              <span className="code">{interfaceLabel(joint!.code!)}</span>
              <span className="text-muted">·</span>
              <span title="sky side → sensor side">{jointGenders(joint!)}</span>
            </span>
          )}
        </div>
      </EdgeLabelRenderer>
    </>
  );
}

export const edgeTypes = { joint: JointEdgeView };
