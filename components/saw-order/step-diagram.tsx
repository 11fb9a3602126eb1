import type { StepGeometry } from '@/lib/saw-order/step-geometry';
import type { Rect } from '@/lib/geometry/rect';
import type { SawPiece } from '@/shared/schemas/nesting';

const ROLE_CLASS: Record<SawPiece['role'], string> = {
  part: 'fill-sage-wash stroke-sage',
  piece: 'fill-white stroke-graphite-faint',
  offcut: 'fill-amber-wash stroke-amber',
  waste: 'fill-brick-wash stroke-brick',
};

/**
 * One saw-order step on its stock piece, drawn from the same geometry the tests check: the piece being cut shaded,
 * what the cut leaves coloured by role (parts it frees in sage), the blade's path in brick and the fence edge as a
 * heavy bar with the fence dimension beside it. Lines keep their width at any size (non-scaling strokes).
 */
export function StepDiagram({
  geometry,
  stock,
  parts = [],
  className = '',
  title,
}: {
  geometry: StepGeometry;
  stock: { length: number; width: number };
  parts?: readonly Rect[];
  className?: string;
  title?: string;
}) {
  const pad = Math.max(stock.length, stock.width) * 0.03;
  const { piece, line, fenceEdge, fenceDimension, produces, before, step } = geometry;
  const vector = { vectorEffect: 'non-scaling-stroke' as const };
  return (
    <svg
      viewBox={`${-pad} ${-pad} ${stock.length + 2 * pad} ${stock.width + 2 * pad}`}
      className={className}
      role="img"
      aria-label={title ?? `Step ${step.n}: ${step.kind} of piece ${step.piece}`}
      data-testid={`diagram-${step.n}`}
    >
      <rect x={0} y={0} width={stock.length} height={stock.width} className="fill-paper-deep stroke-paper-edge" strokeWidth={1} style={vector} />
      {before
        .filter((b) => b.name !== step.piece)
        .map((b) => (
          <rect
            key={b.name}
            x={b.rect.x}
            y={b.rect.y}
            width={b.rect.w}
            height={b.rect.h}
            className="fill-paper stroke-graphite-faint"
            strokeWidth={0.75}
            style={vector}
          />
        ))}
      <rect x={piece.x} y={piece.y} width={piece.w} height={piece.h} className="fill-oak-wash stroke-oak" strokeWidth={1.5} style={vector} />
      {produces.map((p) => (
        <rect
          key={p.name}
          x={p.x}
          y={p.y}
          width={p.w}
          height={p.h}
          className={ROLE_CLASS[p.role]}
          strokeWidth={p.role === 'piece' ? 0.75 : 1.25}
          style={vector}
          fillOpacity={p.role === 'piece' ? 0.4 : 1}
        />
      ))}
      {parts.map((r, i) => (
        <rect
          key={i}
          x={r.x}
          y={r.y}
          width={r.w}
          height={r.h}
          className="fill-none stroke-graphite-faint"
          strokeWidth={0.75}
          strokeDasharray="3 2"
          style={vector}
        />
      ))}
      <line {...fenceDimension} className="stroke-graphite-soft" strokeWidth={1} strokeDasharray="4 3" style={vector} />
      <line {...fenceEdge} className="stroke-graphite" strokeWidth={6} strokeLinecap="square" style={vector} data-role="fence" />
      <line {...line} className="stroke-brick" strokeWidth={3} style={vector} data-role="cut" />
    </svg>
  );
}
