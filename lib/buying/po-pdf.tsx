/**
 * A purchase order as a PDF, made with @react-pdf/renderer in the font the app ships (lib/pdf/fonts.ts), so sizes
 * print as on screen (¾″, 18 mm): the shop and its details, the supplier, the lines at their unit costs and the total.
 */
import { Document, Page, StyleSheet, Text, View, renderToBuffer } from '@react-pdf/renderer';
import { formatMoney } from '@/lib/costing/money';
import { registerPdfFonts } from '@/lib/pdf/fonts';
import { PDF_BASE_STYLES, PDF_INK } from '@/lib/pdf/styles';

export interface PoPdfLine {
  description: string;
  quantity: number;
  /** "sheet" or "bd ft": what the unit cost is per. */
  costUnit: string;
  unitCostCents: number;
  /** Boards: the board feet of one board (the unit cost is per board foot). */
  boardFeetEach: number | null;
  totalCents: number;
}

export interface PoPdfInput {
  shop: { name: string; details: string };
  title: string;
  issued: string;
  supplier: { name: string; email: string };
  currency: string;
  lines: PoPdfLine[];
  totalCents: number;
  note: string;
  pageSize: 'LETTER' | 'A4';
}

const ink = PDF_INK;
const s = StyleSheet.create({
  ...PDF_BASE_STYLES,
  unit: { width: 95, textAlign: 'right' },
});

const bf = (n: number) => (Math.round(n * 100) / 100).toLocaleString('en-US', { maximumFractionDigits: 2 });

function PoDocument({ po }: { po: PoPdfInput }) {
  const money = (m: number) => formatMoney(m, po.currency);
  return (
    <Document title={po.title} author={po.shop.name} subject={`Purchase order for ${po.supplier.name}`}>
      <Page size={po.pageSize} style={s.page}>
        <View style={s.head}>
          <View style={{ maxWidth: 280 }}>
            <Text style={s.shop}>{po.shop.name}</Text>
            {po.shop.details ? <Text style={s.muted}>{po.shop.details}</Text> : null}
          </View>
          <View>
            <Text style={s.title}>Purchase order {po.title}</Text>
            <Text style={[s.muted, { textAlign: 'right' }]}>Issued {po.issued}</Text>
          </View>
        </View>
        <View style={{ marginBottom: 16 }}>
          <Text style={s.th}>TO</Text>
          <Text style={s.strong}>{po.supplier.name}</Text>
          {po.supplier.email ? <Text style={s.muted}>{po.supplier.email}</Text> : null}
        </View>
        <View style={[s.row, { borderBottomColor: ink }]} fixed>
          <Text style={[s.item, s.th]}>STOCK SIZE</Text>
          <Text style={[s.qty, s.th]}>QTY</Text>
          <Text style={[s.unit, s.th]}>UNIT COST</Text>
          <Text style={[s.amount, s.th]}>AMOUNT</Text>
        </View>
        {po.lines.map((l, i) => (
          <View key={i} style={s.row} wrap={false}>
            <View style={s.item}>
              <Text>{l.description}</Text>
              {l.boardFeetEach !== null ? (
                <Text style={s.muted}>
                  {bf(l.boardFeetEach)} bd ft each, {bf(l.boardFeetEach * l.quantity)} bd ft in all
                </Text>
              ) : null}
            </View>
            <Text style={s.qty}>{String(l.quantity)}</Text>
            <Text style={s.unit}>
              {money(l.unitCostCents)} / {l.costUnit}
            </Text>
            <Text style={s.amount}>{money(l.totalCents)}</Text>
          </View>
        ))}
        <View style={[s.row, { borderBottomWidth: 0, borderTopWidth: 0.75, borderTopColor: ink, marginTop: 4 }]} wrap={false}>
          <Text style={[s.item, s.strong]}>Total</Text>
          <Text style={[s.amount, s.strong]}>{money(po.totalCents)}</Text>
        </View>
        {po.note ? (
          <View style={s.block} wrap={false}>
            <Text style={s.th}>NOTE</Text>
            <Text>{po.note}</Text>
          </View>
        ) : null}
        <View style={s.block} wrap={false}>
          <Text style={s.muted}>Please quote {po.title} on the delivery note and the invoice.</Text>
        </View>
        <View style={s.footer} fixed>
          <Text>
            {po.shop.name} · {po.title}
          </Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}

export async function purchaseOrderPdf(po: PoPdfInput): Promise<Buffer> {
  registerPdfFonts();
  return renderToBuffer(<PoDocument po={po} />);
}
