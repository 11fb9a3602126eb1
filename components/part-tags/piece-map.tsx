import type { PlanPiece } from '@/shared/schemas/nesting';

/** A stock piece's placements with one part's instance (or all its instances) picked out. */
export function PieceMap({ piece, partId, instance, className = '' }: { piece: PlanPiece; partId: string; instance?: number; className?: string }) {
  const pad = Math.max(piece.length, piece.width) * 0.02;
  const mine = (p: PlanPiece['placements'][number]) => p.partId === partId && (instance === undefined || p.instance === instance);
  return (
    <svg
      viewBox={`${-pad} ${-pad} ${piece.length + 2 * pad} ${piece.width + 2 * pad}`}
      className={className}
      role="img"
      aria-label="Where the part lies on its stock piece"
    >
      <rect
        width={piece.length}
        height={piece.width}
        className="fill-paper-deep stroke-graphite-faint"
        strokeWidth={1}
        style={{ vectorEffect: 'non-scaling-stroke' }}
      />
      {piece.placements.map((p) => (
        <rect
          key={`${p.partId}#${p.instance}`}
          x={p.x}
          y={p.y}
          width={p.w}
          height={p.h}
          className={mine(p) ? 'fill-oak stroke-oak-deep' : 'fill-white stroke-graphite-faint'}
          strokeWidth={mine(p) ? 2 : 1}
          style={{ vectorEffect: 'non-scaling-stroke' }}
          data-highlight={mine(p) || undefined}
        />
      ))}
    </svg>
  );
}
