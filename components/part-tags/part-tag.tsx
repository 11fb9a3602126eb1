import type { PartTag as Tag, TagText } from '@/lib/saw-order/part-tags';
import type { QrPath } from '@/lib/saw-order/qr-path';

/** The grain runs along the part's length: the arrow points along the first size on the tag. */
function GrainArrow() {
  return (
    <svg viewBox="0 0 40 8" className="h-[2.2mm] w-[9mm] shrink-0" role="img" aria-label="Grain runs along the length">
      <path d="M1 4h34M30 1l6 3-6 3" className="fill-none stroke-graphite" strokeWidth={1.4} />
    </svg>
  );
}

/**
 * One part tag, sized in mm for label sheets: job, part with its "#n", size, material and thickness, grain arrow,
 * stock piece and a QR code to the part's page. Nothing that tells parts apart is cut off: a long name is abbreviated
 * (marked `data-abbreviates`) but its "#n" stands apart and stays whole, the size shrinks to fit its line, and the
 * thickness stays whole beside the material.
 */
export function PartTag({
  tag,
  text,
  jobName,
  qr,
  url,
  label,
}: {
  tag: Tag;
  text: TagText;
  jobName: string;
  qr: QrPath;
  url: string;
  label: { width: number; height: number };
}) {
  const qrSide = Math.min(label.height - 3, label.width * 0.38);
  return (
    <div
      className="flex items-center gap-[1.5mm] overflow-hidden bg-white px-[2mm] text-graphite"
      style={{ width: `${label.width}mm`, height: `${label.height}mm` }}
      data-testid="part-tag"
    >
      <svg
        viewBox={`0 0 ${qr.size} ${qr.size}`}
        style={{ width: `${qrSide}mm`, height: `${qrSide}mm` }}
        className="shrink-0"
        role="img"
        aria-label={`QR code: ${url}`}
      >
        <rect width={qr.size} height={qr.size} fill="#fff" />
        <path d={qr.d} fill="#000" shapeRendering="crispEdges" />
      </svg>
      <div className="@container min-w-0 flex-1 leading-[1.15]">
        <div className="truncate text-[6pt] text-graphite-mute" data-abbreviates>
          {jobName}
        </div>
        <div className="flex min-w-0 items-baseline gap-[1mm] text-[8.5pt] font-semibold">
          <span className="min-w-0 truncate" data-abbreviates data-testid="tag-name">
            {text.name}
          </span>
          <span className="shrink-0 font-normal text-graphite-mute" data-testid="tag-number">
            {text.number}
          </span>
        </div>
        <div
          className="whitespace-nowrap font-mono font-medium"
          style={{ fontSize: `min(8pt, calc(100cqi / ${([...text.size].length * 0.62).toFixed(2)}))` }}
          data-testid="tag-size"
        >
          {text.size}
        </div>
        <div className="flex min-w-0 items-baseline gap-[1mm] text-[6.5pt]">
          <span className="min-w-0 truncate" data-abbreviates>
            {text.material}
          </span>
          <span className="shrink-0 whitespace-nowrap" data-testid="tag-thickness">
            {text.thickness}
          </span>
        </div>
        <div className="flex items-center gap-[1.5mm] text-[6pt] text-graphite-soft">
          {tag.grain ? (
            <>
              <GrainArrow /> grain
            </>
          ) : (
            <span>grain either way</span>
          )}
          <span className="ml-auto shrink-0">{text.piece}</span>
        </div>
      </div>
    </div>
  );
}
