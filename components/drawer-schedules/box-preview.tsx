import type { SizedBox } from '@/lib/joinery/types';
import { formatLength } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';

/** A plan (from above) and an elevation (from the front) of one box, to scale, with its outside sizes. */
export function BoxPreview({ box, t, units }: { box: SizedBox; t: { front: number; back: number; side: number }; units: ShopUnits }) {
  const len = (mm: number) => formatLength(mm, units);
  const pad = 28;
  const scale = 220 / Math.max(box.widthMm, box.depthMm, box.heightMm);
  const W = box.widthMm * scale;
  const D = box.depthMm * scale;
  const H = box.heightMm * scale;
  const wall = box.heightMm - box.wallHeightMm;
  return (
    <svg role="img" aria-label={`Box ${len(box.widthMm)} wide, ${len(box.heightMm)} high, ${len(box.depthMm)} deep`} viewBox={`0 0 ${W * 2 + pad * 4} ${Math.max(D, H) + pad * 2 + 16}`} className="h-auto w-full max-w-xl">
      <g transform={`translate(${pad},${pad})`}>
        <text x={0} y={-10} className="fill-graphite-mute text-[10px]">Plan</text>
        <rect width={W} height={D} className="fill-oak-wash stroke-oak-deep" strokeWidth={1} />
        <rect x={t.side * scale} y={t.back * scale} width={W - 2 * t.side * scale} height={D - (t.front + t.back) * scale} className="fill-white stroke-oak" strokeWidth={0.75} />
        <text x={W / 2} y={D + 14} textAnchor="middle" className="fill-graphite text-[10px]">{len(box.widthMm)}</text>
        <text x={W + 6} y={D / 2} className="fill-graphite text-[10px]" dominantBaseline="middle">{len(box.depthMm)}</text>
        <text x={W / 2} y={D - 3} textAnchor="middle" className="fill-graphite-mute text-[8px]">front</text>
      </g>
      <g transform={`translate(${pad * 3 + W},${pad})`}>
        <text x={0} y={-10} className="fill-graphite-mute text-[10px]">Front</text>
        <rect width={W} height={H} className="fill-oak-wash stroke-oak-deep" strokeWidth={1} />
        {wall > 0 && <rect y={H - wall * scale} width={W} height={wall * scale} className="fill-oak-light stroke-oak-deep" strokeWidth={0.5} />}
        <text x={W / 2} y={H + 14} textAnchor="middle" className="fill-graphite text-[10px]">{len(box.widthMm)}</text>
        <text x={W + 6} y={H / 2} className="fill-graphite text-[10px]" dominantBaseline="middle">{len(box.heightMm)}</text>
      </g>
    </svg>
  );
}
