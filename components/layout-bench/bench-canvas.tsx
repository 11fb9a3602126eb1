'use client';

import type Konva from 'konva';
import { memo, useMemo, useRef } from 'react';
import { Arrow, Group, Layer, Line, Rect, Stage, Text } from 'react-konva';
import { useStore } from 'zustand';
import { BENCH_COLORS as C, partTone } from '@/lib/layout-bench/colors';
import type { BenchDoc, PartInfo } from '@/lib/layout-bench/document';
import { fitLabel } from '@/lib/layout-bench/labels';
import type { LiveCheck } from '@/lib/layout-bench/live-check';
import type { BenchStore, Camera } from '@/lib/layout-bench/store';
import { pieceAt, placementAt, type PieceFrame } from '@/lib/layout-bench/world';

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
}

/**
 * The bench canvas. Konva only draws: pointer input is hit-tested on the geometry model (`placementAt`, `pieceAt`)
 * and goes to the store; the drawn parts do not listen for events. The parts layer redraws when the document,
 * selection, zoom or live check change; during a drag only the small drag layer does.
 */
export default function BenchCanvas(props: BenchCanvasProps) {
  const { store, frames, editable, width, height } = props;
  const camera = useStore(store, (s) => s.view.camera);
  const doc = useStore(store, (s) => s.doc);
  const selection = useStore(store, (s) => s.view.selection);
  const dragKey = useStore(store, (s) => s.view.drag?.key ?? null);
  const gesture = useRef<{ kind: 'drag'; dx: number; dy: number } | { kind: 'pan'; sx: number; sy: number; camera: Camera } | null>(null);
  // Labels are laid out for the zoom in steps, so a smooth zoom does not re-lay every label each frame.
  const labelScale = Math.pow(2, Math.round(Math.log2(camera.scale) * 4) / 4);

  const toWorld = (stage: Konva.Stage) => {
    const p = stage.getPointerPosition() ?? { x: 0, y: 0 };
    const cam = store.getState().view.camera;
    return { sx: p.x, sy: p.y, wx: (p.x - cam.x) / cam.scale, wy: (p.y - cam.y) / cam.scale };
  };

  const onDown = (e: Konva.KonvaEventObject<MouseEvent | TouchEvent>) => {
    const stage = e.target.getStage();
    if (!stage) return;
    const { sx, sy, wx, wy } = toWorld(stage);
    const s = store.getState();
    const key = placementAt(s.doc, frames, wx, wy);
    const additive = 'shiftKey' in e.evt && e.evt.shiftKey;
    if (key) {
      s.select(additive ? (s.view.selection.includes(key) ? s.view.selection.filter((k) => k !== key) : [...s.view.selection, key]) : [key]);
      const p = s.doc.placements[key];
      if (editable && !additive && s.beginDrag(key)) {
        const f = frames[p.piece];
        gesture.current = { kind: 'drag', dx: wx - (f.x + p.x), dy: wy - (f.y + p.y) };
        return;
      }
    } else if (!additive) s.select([]);
    gesture.current = { kind: 'pan', sx, sy, camera: s.view.camera };
  };

  const onMove = (e: Konva.KonvaEventObject<MouseEvent | TouchEvent>) => {
    const g = gesture.current;
    const stage = e.target.getStage();
    if (!g || !stage) return;
    const { sx, sy, wx, wy } = toWorld(stage);
    const s = store.getState();
    if (g.kind === 'pan') {
      s.setCamera({ ...g.camera, x: g.camera.x + sx - g.sx, y: g.camera.y + sy - g.sy });
      return;
    }
    const drag = s.view.drag;
    if (!drag) return;
    const frame = pieceAt(frames, wx, wy) ?? frames[drag.piece];
    s.dragTo(frame.piece, wx - g.dx - frame.x, wy - g.dy - frame.y, SNAP_PX / s.view.camera.scale);
  };

  const onUp = () => {
    if (gesture.current?.kind === 'drag') store.getState().endDrag();
    gesture.current = null;
  };

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
            {byPiece[f.piece].map(([key, p]) => {
              const info = parts.get(p.partId);
              const problem = check.byPlacement.has(key);
              const isSelected = selected.has(key);
              const label = fitLabel(
                p.label || info?.label || p.partId,
                info ? `${fmt(info.length)} × ${fmt(info.width)}` : '',
                p.w * scale,
                p.h * scale,
              );
              const grainArrow = info?.grain === 'along-length' && piece.grain !== 'none' && Math.min(p.w, p.h) * scale > 14;
              return (
                <Group key={key} x={p.x} y={p.y} opacity={key === dragKey ? 0.35 : 1}>
                  <Rect
                    width={p.w}
                    height={p.h}
                    fill={info ? partTone(info.group, info.material, info.thickness) : C.stock}
                    stroke={problem ? C.problem : isSelected ? C.selected : p.locked ? C.locked : C.partEdge}
                    strokeWidth={(problem || isSelected ? 3 : p.locked ? 2 : 0.75) * px}
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
            })}
          </Group>
        );
      })}
    </Layer>
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
