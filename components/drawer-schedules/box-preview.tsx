import type { SizedBox } from '@/lib/joinery/types';
import { formatLength } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';

/** Size of the dimension labels (viewBox units) and the width of a character in the monospaced face (0.6 em). */
const LABEL = 12;
const labelWidth = (text: string) => [...text].length * LABEL * 0.62;

/**
 * A plan (from above) and an elevation (from the front) of one box, to scale, with its outside sizes. The drawing
 * leaves room for its labels, whatever their length: the depth label between the two views, the height label to the
 * right of the front.
 */
export function BoxPreview({ box, t, units }: { box: SizedBox; t: { front: number; back: number; side: number }; units: ShopUnits }) {
  const len = (mm: number) => formatLength(mm, units);
  const pad = 28;
  const scale = 220 / Math.max(box.width, box.depth, box.height);
  const W = box.width * scale;
  const D = box.depth * scale;
  const H = box.height * scale;
  const wall = box.height - box.wallHeight;
  const [width, depth, height] = [len(box.width), len(box.depth), len(box.height)];
  // Bottom labels are centred under the views: a view narrower than its label gets room either side.
  const side = Math.max(0, (labelWidth(width) - W) / 2);
  const gap = Math.max(pad * 2, labelWidth(depth) + 16 + side * 2);
  const right = Math.max(pad, labelWidth(height) + 10, side + 4);
  const frontX = pad + side + W + gap;
  const viewW = frontX + W + right;
  const viewH = Math.max(D, H) + pad + LABEL + 16;
  return (
    <svg
      role="img"
      aria-label={`Box ${width} wide, ${height} high, ${depth} deep`}
      viewBox={`0 0 ${viewW} ${viewH}`}
      className="h-auto w-full max-w-xl"
      data-testid="box-preview"
    >
      <g transform={`translate(${pad + side},${pad})`}>
        <text x={0} y={-10} className="fill-graphite-mute" fontSize={LABEL}>
          Plan
        </text>
        <rect width={W} height={D} className="fill-oak-wash stroke-oak-deep" strokeWidth={1} />
        <rect
          x={t.side * scale}
          y={t.back * scale}
          width={W - 2 * t.side * scale}
          height={D - (t.front + t.back) * scale}
          className="fill-white stroke-oak"
          strokeWidth={0.75}
        />
        <text x={W / 2} y={D + LABEL + 4} textAnchor="middle" className="fill-graphite font-mono" fontSize={LABEL}>
          {width}
        </text>
        <text x={W + 8} y={D / 2} className="fill-graphite font-mono" fontSize={LABEL} dominantBaseline="middle">
          {depth}
        </text>
        {D > LABEL + 4 && (
          <text x={W / 2} y={D - 4} textAnchor="middle" className="fill-graphite-mute" fontSize={LABEL * 0.8}>
            front
          </text>
        )}
      </g>
      <g transform={`translate(${frontX},${pad})`}>
        <text x={0} y={-10} className="fill-graphite-mute" fontSize={LABEL}>
          Front
        </text>
        <rect width={W} height={H} className="fill-oak-wash stroke-oak-deep" strokeWidth={1} />
        {wall > 0 && <rect y={H - wall * scale} width={W} height={wall * scale} className="fill-oak-light stroke-oak-deep" strokeWidth={0.5} />}
        <text x={W / 2} y={H + LABEL + 4} textAnchor="middle" className="fill-graphite font-mono" fontSize={LABEL}>
          {width}
        </text>
        <text x={W + 8} y={H / 2} className="fill-graphite font-mono" fontSize={LABEL} dominantBaseline="middle">
          {height}
        </text>
      </g>
    </svg>
  );
}
