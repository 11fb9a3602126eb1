/** The house style every react-pdf document shares (quotes, purchase orders): ink, rules, the page and its table. */
import { PDF_FONT_FAMILY } from './fonts';

export const PDF_INK = '#2b2a27';
export const PDF_MUTE = '#6b6862';
export const PDF_RULE = '#d9d4c7';

export const PDF_BASE_STYLES = {
  page: { fontFamily: PDF_FONT_FAMILY, fontSize: 9.5, color: PDF_INK, padding: 40, paddingBottom: 56 },
  head: { flexDirection: 'row', justifyContent: 'space-between', marginBottom: 18 },
  shop: { fontSize: 16, fontWeight: 600 },
  title: { fontSize: 13, fontWeight: 600, textAlign: 'right' },
  muted: { color: PDF_MUTE },
  row: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: PDF_RULE, paddingVertical: 4 },
  th: { fontWeight: 600, color: PDF_MUTE, fontSize: 8.5 },
  item: { flex: 1, paddingRight: 8 },
  qty: { width: 40, textAlign: 'right' },
  amount: { width: 80, textAlign: 'right' },
  strong: { fontWeight: 600 },
  block: { marginTop: 16 },
  footer: {
    position: 'absolute',
    bottom: 24,
    left: 40,
    right: 40,
    fontSize: 8,
    color: PDF_MUTE,
    flexDirection: 'row',
    justifyContent: 'space-between',
  },
} as const;
