import type { PartTag as Tag } from '@/lib/saw-order/part-tags';
import type { QrPath } from '@/lib/saw-order/qr-path';

/** The grain runs along the part's length: the arrow points along the first size on the tag. */
function GrainArrow() {
  return (
    <svg viewBox="0 0 40 8" className="h-[2.2mm] w-[9mm]" role="img" aria-label="Grain runs along the length">
      <path d="M1 4h34M30 1l6 3-6 3" className="fill-none stroke-graphite" strokeWidth={1.4} />
    </svg>
  );
}

/** One part tag: job, part, size in the shop's unit, grain arrow and a QR code to the part's page. Sized in mm for label sheets. */
export function PartTag({ tag, jobName, size, qr, url, label }: { tag: Tag; jobName: string; size: string; qr: QrPath; url: string; label: { width: number; height: number } }) {
  const qrSide = Math.min(label.height - 3, label.width * 0.38);
  return (
    <div
      className="flex items-center gap-[1.5mm] overflow-hidden bg-white px-[2mm] text-graphite"
      style={{ width: `${label.width}mm`, height: `${label.height}mm` }}
      data-testid="part-tag"
    >
      <svg viewBox={`0 0 ${qr.size} ${qr.size}`} style={{ width: `${qrSide}mm`, height: `${qrSide}mm` }} className="shrink-0" role="img" aria-label={`QR code: ${url}`}>
        <rect width={qr.size} height={qr.size} fill="#fff" />
        <path d={qr.d} fill="#000" shapeRendering="crispEdges" />
      </svg>
      <div className="min-w-0 flex-1 leading-tight">
        <div className="truncate text-[6.5pt] text-graphite-mute">{jobName}</div>
        <div className="truncate text-[9.5pt] font-semibold">
          {tag.label} <span className="font-normal text-graphite-mute">#{tag.instance}</span>
        </div>
        <div className="flex items-center gap-[1mm] font-mono text-[8.5pt] font-medium">
          <span className="truncate">{size}</span>
        </div>
        <div className="flex items-center gap-[1.5mm] text-[6.5pt] text-graphite-soft">
          {tag.grain ? (
            <>
              <GrainArrow /> grain
            </>
          ) : (
            <span>grain either way</span>
          )}
          <span className="ml-auto">Piece {tag.pieceName}</span>
        </div>
      </div>
    </div>
  );
}
