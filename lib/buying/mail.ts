/**
 * The buying mails: a purchase order to its supplier (the PDF attached) and the owners' low-stock digest. Each has a
 * plain-text part complete on its own and a simple HTML part: inline styles, no images or remote content, every
 * value escaped.
 */
import { escapeHtml, mailFrame, type RenderedMail } from '@/lib/mail/templates';

const layout = (shopName: string, body: string) => mailFrame(shopName, body, 600);
const p = (html: string) => `<p style="margin:0 0 16px;font-size:15px;line-height:1.5;color:#2b2a27">${html}</p>`;

export interface PoMailLine {
  description: string;
  quantity: number;
}

export function purchaseOrderMail(input: {
  shopName: string;
  shopDetails: string;
  title: string;
  supplier: string;
  lines: PoMailLine[];
  total: string;
  note: string;
}): RenderedMail {
  const subject = `Purchase order ${input.title} from ${input.shopName}`;
  const text = [
    `Hello ${input.supplier},`,
    '',
    `Please find our purchase order ${input.title} attached (PDF). In short:`,
    '',
    ...input.lines.map((l) => `  ${l.quantity} × ${l.description}`),
    '',
    `Total: ${input.total}`,
    ...(input.note ? ['', input.note] : []),
    '',
    `Please quote ${input.title} on the delivery note and the invoice.`,
    '',
    `— ${input.shopName}`,
    ...(input.shopDetails ? [input.shopDetails] : []),
    '',
  ].join('\n');
  const rows = input.lines
    .map(
      (l) =>
        `<tr><td style="padding:4px 12px 4px 0;font-size:14px;color:#2b2a27;text-align:right;white-space:nowrap">${l.quantity} ×</td><td style="padding:4px 0;font-size:14px;color:#2b2a27">${escapeHtml(l.description)}</td></tr>`,
    )
    .join('\n');
  const html = layout(
    input.shopName,
    [
      p(`Hello ${escapeHtml(input.supplier)},`),
      p(`Please find our purchase order <strong>${escapeHtml(input.title)}</strong> attached (PDF). In short:`),
      `<table style="border-collapse:collapse;margin:0 0 16px">${rows}</table>`,
      p(`Total: <strong>${escapeHtml(input.total)}</strong>`),
      input.note ? p(escapeHtml(input.note).replace(/\n/g, '<br>')) : '',
      p(`Please quote ${escapeHtml(input.title)} on the delivery note and the invoice.`),
      p(
        `— ${escapeHtml(input.shopName)}${input.shopDetails ? `<br><span style="color:#7a766c;font-size:13px">${escapeHtml(input.shopDetails).replace(/\n/g, '<br>')}</span>` : ''}`,
      ),
    ].join('\n'),
  );
  return { subject, text, html };
}

export interface DigestLine {
  description: string;
  free: number;
  mark: number;
  supplier: string;
}

export function lowStockDigestMail(input: { shopName: string; personName: string; day: string; lines: DigestLine[]; link: string }): RenderedMail {
  const n = input.lines.length;
  const subject = `${n} stock ${n === 1 ? 'size' : 'sizes'} running low at ${input.shopName}`;
  const text = [
    `Hello ${input.personName},`,
    '',
    `On ${input.day}, ${n === 1 ? 'this size is' : 'these sizes are'} at or below the low mark and on no open purchase order:`,
    '',
    ...input.lines.map((l) => `  ${l.description}: ${l.free} free, mark ${l.mark}${l.supplier ? ` (${l.supplier})` : ''}`),
    '',
    `Order them from the Purchase orders page: ${input.link}`,
    '',
    'This digest comes once a day, only when something is low. The time is in Purchase orders → Buying settings.',
    '',
    `— Kerfwise, for ${input.shopName}`,
    '',
  ].join('\n');
  const rows = input.lines
    .map(
      (l) =>
        `<tr><td style="padding:6px 12px 6px 0;border-bottom:1px solid #e2ddd2;font-size:14px;color:#2b2a27">${escapeHtml(l.description)}${l.supplier ? `<br><span style="font-size:12px;color:#7a766c">${escapeHtml(l.supplier)}</span>` : ''}</td><td style="padding:6px 12px 6px 0;border-bottom:1px solid #e2ddd2;font-size:14px;color:#2b2a27;text-align:right">${l.free}</td><td style="padding:6px 0;border-bottom:1px solid #e2ddd2;font-size:14px;color:#7a766c;text-align:right">${l.mark}</td></tr>`,
    )
    .join('\n');
  const html = layout(
    input.shopName,
    [
      p(`Hello ${escapeHtml(input.personName)},`),
      p(`On ${escapeHtml(input.day)}, ${n === 1 ? 'this size is' : 'these sizes are'} at or below the low mark and on no open purchase order:`),
      `<table style="border-collapse:collapse;width:100%;margin:0 0 16px"><tr><th style="text-align:left;font-size:12px;color:#7a766c;padding:0 12px 4px 0">Size</th><th style="text-align:right;font-size:12px;color:#7a766c;padding:0 12px 4px 0">Free</th><th style="text-align:right;font-size:12px;color:#7a766c;padding:0 0 4px">Mark</th></tr>${rows}</table>`,
      `<p style="margin:24px 0"><a href="${escapeHtml(input.link)}" style="display:inline-block;background:#2b2a27;color:#ffffff;text-decoration:none;padding:12px 20px;border-radius:6px;font-size:15px;font-weight:600">Open purchase orders</a></p>`,
      `<p style="margin:0 0 12px;font-size:13px;line-height:1.5;color:#7a766c">This digest comes once a day, only when something is low. The time is in Purchase orders → Buying settings.</p>`,
    ].join('\n'),
  );
  return { subject, text, html };
}
