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
  const widest = Math.max(face.width, box.width, opening?.width ?? 0);
  const tallest = Math.max(face.height, box.height, opening?.height ?? 0);
  const scale = 260 / Math.max(widest, tallest);
  const pad = 8;
  const w = widest * scale + 2 * pad;
  const h = tallest * scale + 2 * pad;
  // Every rectangle centred on the same point: the sketch shows widths and margins, not where the slides put the box.
  const rect = (width: number, height: number) => ({
    x: (w - width * scale) / 2,
    y: (h - height * scale) / 2,
    width: width * scale,
    height: height * scale,
  });
  const margin = face.sideMargin;
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
        aria-label={`${name} ${len(face.width)} wide${opening ? ` in a ${len(opening.width)} opening` : ''}`}
        viewBox={`0 0 ${w} ${h}`}
        className="h-auto w-full max-w-xs"
      >
        {opening && (
          <rect {...rect(opening.width, opening.height)} className="fill-none stroke-graphite-mute" strokeWidth={1} strokeDasharray="5 3" />
        )}
        <rect {...rect(box.width, box.height)} className="fill-none stroke-oak" strokeWidth={0.75} strokeDasharray="1.5 2" />
        <rect {...rect(face.width, face.height)} className="fill-oak-wash stroke-oak-deep" strokeWidth={1} fillOpacity={0.85} />
      </svg>
      <figcaption className="mt-2 text-sm">
        <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-3">
          <dt className="text-graphite-mute">{name}</dt>
          <dd className="num text-left">
            {len(face.width)} × {len(face.height)}
          </dd>
          {opening && (
            <>
              <dt className="text-graphite-mute">Opening</dt>
              <dd className="num text-left">
                {len(opening.width)} × {len(opening.height)}
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
