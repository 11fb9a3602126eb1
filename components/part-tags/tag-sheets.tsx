import { labelOrigin, paginate, type LabelSheet } from '@/lib/saw-order/label-sheets';
import type { PartTag as Tag, TagText } from '@/lib/saw-order/part-tags';
import type { QrPath } from '@/lib/saw-order/qr-path';
import { PartTag } from './part-tag';

export interface TagItem {
  tag: Tag;
  text: TagText;
  url: string;
  qr: QrPath;
}

/** Tags laid out on label sheets at their real size, a printed page per sheet. */
export function TagSheets({ items, sheet, jobName }: { items: TagItem[]; sheet: LabelSheet; jobName: string }) {
  const pages = paginate(items, sheet);
  return (
    <div
      className="-mx-4 flex flex-col items-start gap-6 overflow-x-auto px-4 pb-2 sm:mx-0 sm:px-0 print:mx-0 print:block print:overflow-visible print:p-0"
      data-testid="label-sheets"
      data-print-page={sheet.page.css === 'A4' ? 'part-tags-a4' : 'part-tags-letter'}
    >
      {pages.map((page, p) => (
        <div
          key={p}
          className="relative shrink-0 bg-white shadow-md ring-1 ring-paper-edge print:shadow-none print:ring-0 [&:not(:first-child)]:print:break-before-page"
          style={{ width: `${sheet.page.width}mm`, height: `${sheet.page.height}mm` }}
          aria-label={`Label sheet ${p + 1} of ${pages.length}`}
          data-testid="label-sheet"
        >
          {page.map((item, i) => {
            const at = labelOrigin(sheet, i);
            return (
              <div
                key={`${item.tag.partId}#${item.tag.instance}`}
                className="absolute outline-1 outline-dashed outline-paper-edge print:outline-none"
                style={{ left: `${at.x}mm`, top: `${at.y}mm` }}
              >
                <PartTag tag={item.tag} text={item.text} jobName={jobName} qr={item.qr} url={item.url} label={sheet.label} />
              </div>
            );
          })}
        </div>
      ))}
    </div>
  );
}
