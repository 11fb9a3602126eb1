import 'server-only';
import type { Db } from '@/db/open';
import { getShopSettings } from '@/db/queries/shops';
import { getBuyingSettings, getPurchaseOrder, markSent, updateDraft, type PurchaseOrderView } from '@/db/queries/purchase-orders';
import { formatMoney } from '@/lib/costing/money';
import { enqueueMail } from '@/server/mail/outbox';
import { wakeMailSender } from '@/server/mail/service';
import { pdfFileName } from '@/lib/saw-order/pdf-text';
import { pieceBoardFeet } from '@/lib/stock/pricing';
import { shopDay } from '@/lib/dates/shop-time';
import { costUnit, describeSize } from '@/lib/buying/describe';
import { purchaseOrderMail } from '@/lib/buying/mail';
import { purchaseOrderPdf } from '@/lib/buying/po-pdf';

/** The order's PDF as the supplier gets it, and its file name. */
export async function renderPurchaseOrder(db: Db, shopId: string, po: PurchaseOrderView) {
  const [shop, buying] = await Promise.all([getShopSettings({ db, shopId }), getBuyingSettings({ db, shopId })]);
  const lines = po.lines.map((l) => ({
    description: describeSize(l, shop.units),
    quantity: l.quantity,
    costUnit: costUnit(l.kind),
    unitCostCents: l.unitCostCents,
    boardFeetEach: l.kind === 'board' ? pieceBoardFeet(l) : null,
    totalCents: l.totalCents,
  }));
  const bytes = await purchaseOrderPdf({
    shop: { name: shop.name, details: buying.purchaseOrderDetails },
    title: po.title,
    issued: shopDay(po.sentAt ? new Date(po.sentAt) : new Date(), shop.timeZone),
    supplier: { name: po.supplier, email: po.supplierEmail },
    currency: po.currency,
    lines,
    totalCents: po.totalCents,
    note: po.note,
    pageSize: shop.units.system === 'metric' ? 'A4' : 'LETTER',
  });
  return { bytes, filename: `${pdfFileName(`${po.title} ${po.supplier}`)}.pdf`, lines, shop, buying };
}

/**
 * Sends a draft to its supplier: the PDF is made from the order as read, then one transaction checks it is unchanged,
 * queues the mail with the PDF attached and marks it sent. A new address given here is saved on the draft first.
 */
export async function sendPurchaseOrder(db: Db, shopId: string, userId: string, id: string, supplierEmail?: string): Promise<PurchaseOrderView> {
  let po = await getPurchaseOrder({ db, shopId }, id);
  if (supplierEmail && supplierEmail !== po.supplierEmail && po.status === 'draft')
    po = await updateDraft({ db, shopId, userId }, id, { supplierEmail });
  const { bytes, filename, lines, shop, buying } = await renderPurchaseOrder(db, shopId, po);
  const mail = purchaseOrderMail({
    shopName: shop.name,
    shopDetails: buying.purchaseOrderDetails,
    title: po.title,
    supplier: po.supplier,
    lines,
    total: formatMoney(po.totalCents, po.currency),
    note: po.note,
  });
  const to = po.supplierEmail;
  await markSent({ db, shopId, userId }, id, po.updatedAt, (tx) =>
    enqueueMail(tx, {
      shopId,
      kind: 'purchase-order',
      to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      attachments: [{ filename, contentType: 'application/pdf', content: bytes.toString('base64') }],
    }),
  );
  wakeMailSender();
  return getPurchaseOrder({ db, shopId }, id);
}
