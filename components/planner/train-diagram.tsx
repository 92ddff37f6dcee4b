"use client";
// The train as a flow diagram: sky on the left, sensor on the right, one node per item,
// each joint labelled with its interface and which side is male.
import { ReactFlow, type ReactFlowProps, type Viewport } from "@xyflow/react";
import { useEffect, useMemo, useState } from "react";
import { TrainList } from "@/components/builds/train-list";
import type { LengthUnit } from "@/lib/units";
import type { Train, TrainItem } from "./train-model";
import { useWidth } from "./use-width";
import { edgeTypes, nodeTypes, type JointEdge, type TrainNode } from "./train-nodes";

const GAP = 36;

/** Widths grow with length (a minimum keeps the words legible); heights tell kinds apart. */
function size(item: TrainItem): { type: keyof typeof nodeTypes; width: number; height: number } {
  const grow = (base: number, perMm: number) => Math.min(300, Math.round(base + item.lengthMm * perMm));
  switch (item.role) {
    case "telescope": return { type: "optic", width: 132, height: 112 };
    case "optics": return { type: "optic", width: grow(118, 0.9), height: 104 };
    case "station": return { type: "station", width: grow(100, 2.6), height: 86 };
    case "camera": return { type: "camera", width: grow(112, 2.6), height: 96 };
    default: return { type: "connector", width: grow(80, 2.6), height: 60 };
  }
}

type Layout = { nodes: TrainNode[]; edges: JointEdge[]; width: number; top: number; bottom: number };

export function layoutTrain(train: Train, unit: LengthUnit, warnings: Record<string, string> = {}): Layout {
  const nodes: TrainNode[] = [];
  let x = 0;
  const sizes = train.items.map(size);
  const half = Math.max(...sizes.map((s) => s.height)) / 2;
  train.items.forEach((item, i) => {
    const s = sizes[i];
    nodes.push({
      id: item.key, type: s.type, position: { x, y: -s.height / 2 }, width: s.width, height: s.height,
      data: { item, unit, width: s.width, height: s.height, warning: item.role === "telescope" ? undefined : warnings[item.itemId] },
      draggable: false, selectable: false, connectable: false, focusable: false,
    });
    x += s.width + GAP;
  });
  const edges: JointEdge[] = train.joints.map((joint, i) => ({
    id: `j-${i}`, source: nodes[i].id, target: nodes[i + 1].id, type: "joint",
    data: { joint, labelDy: half + 14 + (i % 2) * 26 }, selectable: false, focusable: false,
  }));
  // Joint labels hang below the nodes in two staggered rows.
  return { nodes, edges, width: x - GAP, top: -half, bottom: half + 14 + 26 + 24 };
}

/** Fit the whole train when it reads at a legible zoom; otherwise start at the sky end and let the reader pan. */
function viewportFor(l: Layout, W: number, H: number) {
  const fit = Math.min(1.1, (W - 24) / l.width, (H - 36) / (l.bottom - l.top));
  const zoom = Math.max(0.8, fit);
  const overflow = l.width * zoom > W - 16;
  const x = overflow ? 12 : (W - l.width * zoom) / 2;
  const y = 28 + ((H - 28) - (l.bottom - l.top) * zoom) / 2 - l.top * zoom;
  return { viewport: { x, y, zoom }, overflow };
}

/** A drawing to read and pan, not to edit: nothing drags, connects, selects or takes focus; the page keeps its scroll. */
const LOOK_ONLY = {
  minZoom: 0.3, maxZoom: 2, panOnDrag: true,
  nodesDraggable: false, nodesConnectable: false, elementsSelectable: false, nodesFocusable: false, edgesFocusable: false,
  zoomOnScroll: false, zoomOnDoubleClick: false, preventScrolling: false,
} satisfies Partial<ReactFlowProps>;

export function TrainDiagram({ train, unit, label, warnings }: { train: Train; unit: LengthUnit; label: string; warnings?: Record<string, string> }) {
  const connected = train.connected;
  const layout = useMemo(() => layoutTrain(train, unit, warnings), [train, unit, warnings]);
  const { nodes, edges } = layout;
  const [ref, W] = useWidth<HTMLDivElement>();
  const H = W < 640 ? 230 : 290;
  const fitted = viewportFor(layout, W, H);
  const signature = nodes.map((n) => `${n.id}:${n.data.item.itemId}:${n.data.item.lengthMm}`).join("|");
  // Controlled, so a new train or a new width re-frames it while the reader can still pan.
  const [viewport, setViewport] = useState<Viewport>(fitted.viewport);
  const { x, y, zoom } = fitted.viewport;
  // biome-ignore lint/correctness/useExhaustiveDependencies: the train's signature is the trigger: a new train re-frames even at the same fit
  useEffect(() => setViewport({ x, y, zoom }), [signature, x, y, zoom]);
  const overflow = fitted.overflow;
  return (
    <figure className="m-0">
      {/* Phones read the train as a list, sky at the top: no sideways dragging. */}
      <TrainList train={train} unit={unit} className="sm:hidden" />
      <div ref={ref} data-testid="train-diagram" data-items={nodes.length} aria-label={label} role="group" style={{ height: H }}
        className="relative hidden w-full overflow-hidden rounded-md border border-line bg-bg sm:block">
        <span aria-hidden className="pointer-events-none absolute left-3 top-2 z-10 text-[10px] font-medium uppercase tracking-[0.2em] text-muted">☾ Sky</span>
        <span aria-hidden className="pointer-events-none absolute right-3 top-2 z-10 text-[10px] font-medium uppercase tracking-[0.2em] text-muted">Sensor ▣</span>
        <ReactFlow
          nodes={nodes}
          edges={edges}
          nodeTypes={nodeTypes}
          edgeTypes={edgeTypes}
          viewport={viewport}
          onViewportChange={setViewport}
          {...LOOK_ONLY}
        />
      </div>
      <figcaption className="mt-1.5 hidden text-xs text-muted sm:block">
        {overflow ? <strong className="font-medium text-text">Drag sideways to follow the train to the sensor. </strong> : null}
        Box widths grow with length{connected ? "; the budget below is to scale" : ""}. Each joint reads sky side → sensor side: ♂ male, ♀ female.
      </figcaption>
    </figure>
  );
}
