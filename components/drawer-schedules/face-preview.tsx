import type { DrawerFace, SizedBox } from '@/lib/joinery/types';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { formatLength } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';

/**
 * The drawer's face against its opening, from the front and to scale: the opening dashed, the box behind dotted, the
 * face (lipped box front or applied front) filled, with their sizes and the overlay or reveal written out below.
 */
export function FacePreview({ face, box, units }: { face: DrawerFace; box: SizedBox; units: ShopUnits }) {
  const len = (mm: number) => formatLength(mm, units);
  const opening = face.opening;
  const widest = Math.max(face.widthMm, box.widthMm, opening?.widthMm ?? 0);
  const tallest = Math.max(face.heightMm, box.heightMm, opening?.heightMm ?? 0);
  const scale = 260 / Math.max(widest, tallest);
  const pad = 8;
  const w = widest * scale + 2 * pad;
  const h = tallest * scale + 2 * pad;
  // Every rectangle centred on the same point: the sketch shows widths and margins, not where the slides put the box.
  const rect = (widthMm: number, heightMm: number) => ({
    x: (w - widthMm * scale) / 2,
    y: (h - heightMm * scale) / 2,
    width: widthMm * scale,
    height: heightMm * scale,
  });
  const margin = face.sideMarginMm;
  const fit =
    margin === null
      ? 'No opening given: the front is sized from the box.'
      : Math.abs(margin) < 1e-6
        ? 'Exactly the opening’s width: no gap either side.'
        : margin < 0
          ? `Laps the opening ${exactLengthText(-margin, units)} each side.`
          : `Stops ${exactLengthText(margin, units)} inside the opening each side.`;
  const name = face.role === 'applied-front' ? 'Applied front' : face.lipped ? 'Lipped front' : 'Box front';

  return (
    <figure className="rounded-md border border-paper-edge bg-paper p-3" aria-label="The drawer’s front against its opening">
      <svg
        role="img"
        aria-label={`${name} ${len(face.widthMm)} wide${opening ? ` in a ${len(opening.widthMm)} opening` : ''}`}
        viewBox={`0 0 ${w} ${h}`}
        className="h-auto w-full max-w-xs"
      >
        {opening && (
          <rect {...rect(opening.widthMm, opening.heightMm)} className="fill-none stroke-graphite-mute" strokeWidth={1} strokeDasharray="5 3" />
        )}
        <rect {...rect(box.widthMm, box.heightMm)} className="fill-none stroke-oak" strokeWidth={0.75} strokeDasharray="1.5 2" />
        <rect {...rect(face.widthMm, face.heightMm)} className="fill-oak-wash stroke-oak-deep" strokeWidth={1} fillOpacity={0.85} />
      </svg>
      <figcaption className="mt-2 text-sm">
        <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-3">
          <dt className="text-graphite-mute">{name}</dt>
          <dd className="num text-left">
            {len(face.widthMm)} × {len(face.heightMm)}
          </dd>
          {opening && (
            <>
              <dt className="text-graphite-mute">Opening</dt>
              <dd className="num text-left">
                {len(opening.widthMm)} × {len(opening.heightMm)}
              </dd>
            </>
          )}
          <dt className="text-graphite-mute">Fit</dt>
          <dd>{fit}</dd>
        </dl>
      </figcaption>
    </figure>
  );
}
