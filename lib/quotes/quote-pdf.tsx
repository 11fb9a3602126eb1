/**
 * The quote as a PDF, made with @react-pdf/renderer in the font the app ships (IBM Plex Sans), so
 * fractions print as on screen (19¾″). The customer's copy: shop, customer, lines at their prices, totals, deposit,
 * validity, terms and, once the quote has a customer's page, a QR code and link to it. Never cost, margin or hours.
 */
import { Document, Image, Page, StyleSheet, Text, View, renderToBuffer } from '@react-pdf/renderer';
import QRCode from 'qrcode';
import { formatMoney } from '@/lib/costing/money';
import { registerPdfFonts } from '@/lib/pdf/fonts';
import { PDF_BASE_STYLES, PDF_INK } from '@/lib/pdf/styles';
import type { QuoteTotals } from '@/lib/costing/quote-totals';
import type { QuoteLine } from '@/shared/schemas/quote';

export interface QuotePdfInput {
  shop: { name: string };
  title: string;
  issued: string;
  validUntil: string | null;
  validityDays: number;
  customer: { name: string; company: string; email: string; phone: string; billingAddress: string; siteAddress: string } | null;
  jobName: string;
  currency: string;
  lines: QuoteLine[];
  totals: QuoteTotals;
  taxPercent: number;
  depositPercent: number;
  terms: string;
  /** The customer's page, when the quote has one: printed as a link and a QR code. */
  customerLink: string | null;
  pageSize: 'LETTER' | 'A4';
}

const ink = PDF_INK;
const s = StyleSheet.create({
  ...PDF_BASE_STYLES,
  per: { width: 48, paddingLeft: 6 },
  unit: { width: 75, textAlign: 'right' },
  totals: { marginTop: 10, marginLeft: 'auto', width: 240 },
  totalRow: { flexDirection: 'row', justifyContent: 'space-between', paddingVertical: 2 },
});

function QuoteDocument({ q, qr }: { q: QuotePdfInput; qr: string | null }) {
  const money = (m: number) => formatMoney(m, q.currency);
  const t = q.totals;
  const c = q.customer;
  return (
    <Document title={q.title} author={q.shop.name} subject={`Quote for ${q.jobName}`}>
      <Page size={q.pageSize} style={s.page}>
        <View style={s.head}>
          <View>
            <Text style={s.shop}>{q.shop.name}</Text>
            <Text style={s.muted}>Quote for {q.jobName}</Text>
          </View>
          <View>
            <Text style={s.title}>{q.title}</Text>
            <Text style={[s.muted, { textAlign: 'right' }]}>Issued {q.issued}</Text>
            <Text style={[s.muted, { textAlign: 'right' }]}>
              {q.validUntil ? `Valid until ${q.validUntil}` : `Valid ${q.validityDays} days from sending`}
            </Text>
          </View>
        </View>
        {c && (
          <View style={{ flexDirection: 'row', marginBottom: 16 }}>
            <View style={{ flex: 1 }}>
              <Text style={s.th}>FOR</Text>
              <Text style={s.strong}>{c.name}</Text>
              {c.company ? <Text>{c.company}</Text> : null}
              {c.billingAddress ? <Text>{c.billingAddress}</Text> : null}
              {[c.email, c.phone].filter(Boolean).length ? <Text style={s.muted}>{[c.email, c.phone].filter(Boolean).join(' · ')}</Text> : null}
            </View>
            {c.siteAddress && c.siteAddress !== c.billingAddress ? (
              <View style={{ flex: 1 }}>
                <Text style={s.th}>SITE</Text>
                <Text>{c.siteAddress}</Text>
              </View>
            ) : null}
          </View>
        )}
        <View style={[s.row, { borderBottomColor: ink }]} fixed>
          <Text style={[s.item, s.th]}>ITEM</Text>
          <Text style={[s.qty, s.th]}>QTY</Text>
          <Text style={[s.per, s.th]}>UNIT</Text>
          <Text style={[s.unit, s.th]}>UNIT PRICE</Text>
          <Text style={[s.amount, s.th]}>AMOUNT</Text>
        </View>
        {q.lines.map((l, i) => (
          <View key={l.id} style={s.row} wrap={false}>
            <Text style={s.item}>{l.description}</Text>
            {/* Labour as a sum: hours and rates are the shop's own. */}
            <Text style={s.qty}>{l.kind === 'labour' ? '' : String(l.quantity)}</Text>
            <Text style={s.per}>{l.kind === 'labour' ? '' : l.unit}</Text>
            <Text style={s.unit}>{l.kind === 'labour' ? '' : money(t.lines[i].unitPriceMinor)}</Text>
            <Text style={s.amount}>{money(t.lines[i].priceMinor)}</Text>
          </View>
        ))}
        <View style={s.totals} wrap={false}>
          <View style={s.totalRow}>
            <Text>Subtotal</Text>
            <Text>{money(t.subtotalMinor)}</Text>
          </View>
          {t.discountMinor > 0 ? (
            <View style={s.totalRow}>
              <Text>Discount</Text>
              <Text>−{money(t.discountMinor)}</Text>
            </View>
          ) : null}
          {q.taxPercent > 0 ? (
            <View style={s.totalRow}>
              <Text>Sales tax ({q.taxPercent} %)</Text>
              <Text>{money(t.taxMinor)}</Text>
            </View>
          ) : null}
          <View style={[s.totalRow, { borderTopWidth: 0.75, borderTopColor: ink, marginTop: 2, paddingTop: 4 }]}>
            <Text style={s.strong}>Total</Text>
            <Text style={s.strong}>{money(t.totalMinor)}</Text>
          </View>
          <View style={s.totalRow}>
            <Text>Deposit on acceptance ({q.depositPercent} %)</Text>
            <Text>{money(t.depositMinor)}</Text>
          </View>
          <View style={s.totalRow}>
            <Text>Balance</Text>
            <Text>{money(t.balanceMinor)}</Text>
          </View>
        </View>
        {q.terms ? (
          <View style={s.block} wrap={false}>
            <Text style={s.th}>TERMS</Text>
            <Text>{q.terms}</Text>
          </View>
        ) : null}
        {qr && q.customerLink ? (
          <View style={[s.block, { flexDirection: 'row', alignItems: 'center' }]} wrap={false}>
            <Image src={qr} style={{ width: 72, height: 72, marginRight: 10 }} />
            <View style={{ flex: 1 }}>
              <Text style={s.strong}>Accept or decline this quote online</Text>
              <Text style={s.muted}>{q.customerLink}</Text>
            </View>
          </View>
        ) : null}
        <View style={s.footer} fixed>
          <Text>
            {q.shop.name} · {q.title}
          </Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}

export async function quotePdf(q: QuotePdfInput): Promise<Buffer> {
  registerPdfFonts();
  const qr = q.customerLink ? await QRCode.toDataURL(q.customerLink, { margin: 1, width: 240, errorCorrectionLevel: 'M' }) : null;
  return renderToBuffer(<QuoteDocument q={q} qr={qr} />);
}
