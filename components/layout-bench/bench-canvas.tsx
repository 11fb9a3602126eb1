'use client';

import type Konva from 'konva';
import { memo, useMemo, type MutableRefObject } from 'react';
import { Arrow, Group, Layer, Line, Rect, Stage, Text } from 'react-konva';
import { useStore } from 'zustand';
import { BENCH_COLORS as C, partTone } from '@/lib/layout-bench/colors';
import type { BenchDoc, PartInfo } from '@/lib/layout-bench/document';
import { fitLabel } from '@/lib/layout-bench/labels';
import type { LiveCheck } from '@/lib/layout-bench/live-check';
import { applyGestureEffects, step, type Gesture, type GestureEvent } from '@/components/layout-bench/gesture';
import type { BenchStore } from '@/components/layout-bench/store';
import { placementAt, type PieceFrame } from '@/lib/layout-bench/world';

/** Snap reach on screen: a part within this many pixels of an edge or a neighbour's kerf line lands on it. */
const SNAP_PX = 10;
const MIN_SCALE = 0.01;
const MAX_SCALE = 3;

export interface BenchCanvasProps {
  store: BenchStore;
  frames: PieceFrame[];
  parts: ReadonlyMap<string, PartInfo>;
  check: LiveCheck;
  editable: boolean;
  width: number;
  height: number;
  fmt: (mm: number) => string;
  pieceCaption: (piece: number) => string;
  /** The pointer gesture's state, kept by the bench editor so Escape can cancel a drag. */
  gesture: MutableRefObject<Gesture>;
}

/**
 * The bench canvas. Konva only draws: pointer input is hit-tested on the geometry model (`placementAt`, `pieceAt`)
 * and goes to the store; the drawn parts do not listen for events. The parts layer redraws when the document,
 * selection, zoom or live check change; during a drag only the small drag layer does.
 */
export default function BenchCanvas(props: BenchCanvasProps) {
  const { store, frames, editable, width, height, gesture } = props;
  const camera = useStore(store, (s) => s.view.camera);
  const doc = useStore(store, (s) => s.doc);
  const selection = useStore(store, (s) => s.view.selection);
  const dragKey = useStore(store, (s) => s.view.drag?.key ?? null);
  // Labels are laid out for the zoom in steps, so a smooth zoom does not re-lay every label each frame.
  const labelScale = Math.pow(2, Math.round(Math.log2(camera.scale) * 4) / 4);

  const toWorld = (stage: Konva.Stage) => {
    const p = stage.getPointerPosition() ?? { x: 0, y: 0 };
    const cam = store.getState().view.camera;
    return { sx: p.x, sy: p.y, wx: (p.x - cam.x) / cam.scale, wy: (p.y - cam.y) / cam.scale };
  };

  // Pointer input goes through the gesture machine (components/layout-bench/gesture.ts); its effects go to the store.
  const feed = (event: GestureEvent) => {
    const out = step(gesture.current, event);
    // The gesture is a box the bench shares with the canvas, written in pointer handlers only (never in render).
    // eslint-disable-next-line react-hooks/immutability
    gesture.current = out.state;
    applyGestureEffects(store, frames, out.effects, SNAP_PX);
  };

  const onDown = (e: Konva.KonvaEventObject<MouseEvent | TouchEvent>) => {
    const stage = e.target.getStage();
    if (!stage) return;
    const { sx, sy, wx, wy } = toWorld(stage);
    const s = store.getState();
    const key = placementAt(s.doc, frames, wx, wy);
    const p = key ? s.doc.placements[key] : undefined;
    const target = key && p ? { key, draggable: editable && !p.locked, corner: { x: frames[p.piece].x + p.x, y: frames[p.piece].y + p.y } } : null;
    feed({
      type: 'down',
      screen: { x: sx, y: sy },
      world: { x: wx, y: wy },
      camera: s.view.camera,
      target,
      additive: 'shiftKey' in e.evt && e.evt.shiftKey,
      selection: s.view.selection,
    });
  };

  const onMove = (e: Konva.KonvaEventObject<MouseEvent | TouchEvent>) => {
    const stage = e.target.getStage();
    if (gesture.current.kind === 'idle' || !stage) return;
    const { sx, sy, wx, wy } = toWorld(stage);
    feed({ type: 'move', screen: { x: sx, y: sy }, world: { x: wx, y: wy } });
  };

  const onUp = () => feed({ type: 'up' });

  const onWheel = (e: Konva.KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const stage = e.target.getStage();
    if (!stage) return;
    const { sx, sy, wx, wy } = toWorld(stage);
    const cam = store.getState().view.camera;
    const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, cam.scale * Math.exp(-e.evt.deltaY * 0.0015)));
    store.getState().setCamera({ scale, x: sx - wx * scale, y: sy - wy * scale });
  };

  return (
    <Stage
      width={width}
      height={height}
      x={camera.x}
      y={camera.y}
      scaleX={camera.scale}
      scaleY={camera.scale}
      onMouseDown={onDown}
      onTouchStart={onDown}
      onMouseMove={onMove}
      onTouchMove={onMove}
      onMouseUp={onUp}
      onTouchEnd={onUp}
      onMouseLeave={onUp}
      onWheel={onWheel}
      style={{ cursor: editable ? 'default' : 'grab', touchAction: 'none' }}
    >
      <PiecesLayer {...props} doc={doc} selection={selection} dragKey={dragKey} scale={labelScale} />
      <DragLayer store={store} frames={frames} scale={camera.scale} />
    </Stage>
  );
}

interface PiecesLayerProps extends BenchCanvasProps {
  doc: BenchDoc;
  selection: string[];
  dragKey: string | null;
  scale: number;
}

const PiecesLayer = memo(function PiecesLayer({ doc, frames, parts, check, selection, dragKey, scale, fmt, pieceCaption }: PiecesLayerProps) {
  const selected = useMemo(() => new Set(selection), [selection]);
  const px = 1 / scale;
  const byPiece = useMemo(() => {
    const lists = doc.pieces.map(() => [] as [string, BenchDoc['placements'][string]][]);
    for (const entry of Object.entries(doc.placements)) lists[entry[1].piece]?.push(entry);
    return lists;
  }, [doc]);

  return (
    <Layer listening={false}>
      {frames.map((f) => {
        const piece = doc.pieces[f.piece];
        const left = check.leftovers.get(f.piece);
        const pieceProblems = check.byPiece.get(f.piece);
        return (
          <Group key={f.piece} x={f.x} y={f.y}>
            <Text
              y={-18 * px}
              width={piece.length}
              wrap="none"
              ellipsis
              text={pieceCaption(f.piece)}
              fontSize={12 * px}
              fill={pieceProblems ? C.problem : C.text}
              fontStyle="bold"
              perfectDrawEnabled={false}
            />
            {/* Waste first (the whole piece), then offcuts to keep, then the parts on top. */}
            <Rect
              width={piece.length}
              height={piece.width}
              fill={C.waste}
              stroke={pieceProblems ? C.problem : C.partEdge}
              strokeWidth={(pieceProblems ? 3 : 1) * px}
              perfectDrawEnabled={false}
            />
            {left?.offcuts.map((o, i) => (
              <Rect
                key={`o${i}`}
                x={o.x}
                y={o.y}
                width={o.w}
                height={o.h}
                fill={C.offcut}
                stroke={C.offcutEdge}
                strokeWidth={px}
                dash={[4 * px, 3 * px]}
                perfectDrawEnabled={false}
              />
            ))}
            {!left && piece.trim > 0 && (
              <Rect
                x={piece.trim}
                y={piece.trim}
                width={piece.length - 2 * piece.trim}
                height={piece.width - 2 * piece.trim}
                fill={C.stock}
                perfectDrawEnabled={false}
              />
            )}
            {byPiece[f.piece].map(([key, p]) => (
              <PartNode
                key={key}
                p={p}
                info={parts.get(p.partId)}
                pieceGrain={piece.grain}
                problem={check.byPlacement.has(key)}
                selected={selected.has(key)}
                dragged={key === dragKey}
                scale={scale}
                fmt={fmt}
              />
            ))}
          </Group>
        );
      })}
    </Layer>
  );
});

interface PartNodeProps {
  p: BenchDoc['placements'][string];
  info: PartInfo | undefined;
  pieceGrain: BenchDoc['pieces'][number]['grain'];
  problem: boolean;
  selected: boolean;
  dragged: boolean;
  scale: number;
  fmt: (mm: number) => string;
}

/**
 * One part on its piece. Memoised on its own placement and marks, so a drop or a check's answer re-renders only the
 * parts it changed, not all of them (a drop among hundreds stays within a frame).
 */
const PartNode = memo(function PartNode({ p, info, pieceGrain, problem, selected, dragged, scale, fmt }: PartNodeProps) {
  const px = 1 / scale;
  const label = fitLabel(p.label || info?.label || p.partId, info ? `${fmt(info.length)} × ${fmt(info.width)}` : '', p.w * scale, p.h * scale);
  const grainArrow = info?.grain === 'along-length' && pieceGrain !== 'none' && Math.min(p.w, p.h) * scale > 14;
  return (
    <Group x={p.x} y={p.y} opacity={dragged ? 0.35 : 1}>
      <Rect
        width={p.w}
        height={p.h}
        fill={info ? partTone(info.group, info.material, info.thickness) : C.stock}
        stroke={problem ? C.problem : selected ? C.selected : p.locked ? C.locked : C.partEdge}
        strokeWidth={(problem || selected ? 3 : p.locked ? 2 : 0.75) * px}
        dash={p.locked ? [6 * px, 3 * px] : undefined}
        perfectDrawEnabled={false}
      />
      {grainArrow && <GrainArrow w={p.w} h={p.h} alongX={!p.rotated} px={px} />}
      {label && (
        <Text
          x={4 * px}
          y={3 * px}
          width={Math.max(0, p.w - 8 * px)}
          text={(p.locked ? '▪ ' : '') + label.lines.join('\n')}
          fontSize={label.fontPx * px}
          lineHeight={1.2}
          fill={problem ? C.problem : C.text}
          wrap="none"
          ellipsis
          perfectDrawEnabled={false}
        />
      )}
    </Group>
  );
});

/** A small arrow along the part's length: the way its grain must run. */
function GrainArrow({ w, h, alongX, px }: { w: number; h: number; alongX: boolean; px: number }) {
  const len = Math.min((alongX ? w : h) * 0.5, 60 * px);
  const cx = w / 2;
  const cy = alongX ? h - 9 * px : h / 2;
  const pts = alongX ? [cx - len / 2, cy, cx + len / 2, cy] : [w - 9 * px, cy - len / 2, w - 9 * px, cy + len / 2];
  return (
    <Arrow
      points={pts}
      stroke={C.mute}
      fill={C.mute}
      strokeWidth={1.25 * px}
      pointerLength={5 * px}
      pointerWidth={5 * px}
      perfectDrawEnabled={false}
    />
  );
}

/** The dragged part where it would land, with the edge it snapped to. */
function DragLayer({ store, frames, scale }: { store: BenchStore; frames: PieceFrame[]; scale: number }) {
  const drag = useStore(store, (s) => s.view.drag);
  const placement = useStore(store, (s) => (drag ? s.doc.placements[drag.key] : undefined));
  if (!drag || !placement) return <Layer listening={false} />;
  const f = frames[drag.piece];
  const px = 1 / scale;
  return (
    <Layer listening={false}>
      <Group x={f.x} y={f.y}>
        <Rect
          x={drag.x}
          y={drag.y}
          width={placement.w}
          height={placement.h}
          fill={C.selected}
          opacity={0.45}
          stroke={C.selected}
          strokeWidth={2 * px}
        />
        {drag.snappedX !== null && (
          <Line points={[drag.snappedX, 0, drag.snappedX, f.h]} stroke={C.selected} strokeWidth={px} dash={[5 * px, 4 * px]} />
        )}
        {drag.snappedY !== null && (
          <Line points={[0, drag.snappedY, f.w, drag.snappedY]} stroke={C.selected} strokeWidth={px} dash={[5 * px, 4 * px]} />
        )}
      </Group>
    </Layer>
  );
}
