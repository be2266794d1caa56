/**
 * The quote as a PDF (@react-pdf/renderer, DejaVu Sans embedded as on the job sheet so €, £, ⚠ and − print),
 * from the same QuoteDocument the print view renders.
 */
import { Document, Page, StyleSheet, Text, View, renderToBuffer } from '@react-pdf/renderer';
import { registerFonts } from '@/lib/job-sheet/job-sheet-pdf';
import type { QuoteDocument } from './quote-document';
import { DOCUMENT_FRAME_STYLES, DOCUMENT_INK } from '@/lib/presentation/pdf-frame-styles';

const ink = DOCUMENT_INK;
const s = StyleSheet.create({
  ...DOCUMENT_FRAME_STYLES,
  h2: {
    fontSize: 10.5,
    fontWeight: 'bold',
    marginTop: 10,
    marginBottom: 4,
    borderBottomWidth: 0.5,
    borderBottomColor: '#999',
    paddingBottom: 2,
  },
  cols: { flexDirection: 'row', gap: 14 },
  col: { flex: 1 },
  row: { flexDirection: 'row', marginBottom: 1.5 },
  label: { width: 90, color: '#5a6473' },
  value: { flex: 1 },
  trow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: '#bbb', paddingVertical: 2 },
  thead: { fontWeight: 'bold', borderBottomColor: ink },
  cKind: { width: 62 },
  cDesc: { flex: 1, paddingRight: 4 },
  cQty: { width: 58, textAlign: 'right' },
  cPrice: { width: 64, textAlign: 'right' },
  cTax: { width: 36, textAlign: 'right' },
  cAmt: { width: 70, textAlign: 'right' },
  totals: { marginTop: 6, marginLeft: 'auto', width: 260 },
  trowTotal: { flexDirection: 'row', justifyContent: 'space-between', paddingVertical: 1 },
  strong: { fontWeight: 'bold', fontSize: 10 },
  muted: { color: '#5a6473' },
  draft: { fontSize: 11, fontWeight: 'bold', color: '#a1261b', marginBottom: 4 },
  notice: { marginBottom: 4 },
  sign: { flexDirection: 'row', gap: 12, marginTop: 18 },
  signBox: { flex: 1, borderTopWidth: 0.8, borderTopColor: ink, paddingTop: 2 },
});

const Row = ({ label, value }: { label: string; value: string | null }) => (
  <View style={s.row}>
    <Text style={s.label}>{label}</Text>
    <Text style={s.value}>{value ?? '—'}</Text>
  </View>
);

export function QuotePdfDocument({ d }: { d: QuoteDocument }) {
  return (
    <Document title={`Quote ${d.number}`} author={d.shop.name} subject="Motor repair quote" creator="Coilwright">
      <Page size="A4" style={s.page}>
        <View style={s.header} fixed>
          <Text style={s.shop}>{d.shop.name}</Text>
          <Text>
            Quote {d.number} · job {d.jobNumber}
          </Text>
        </View>
        <View style={s.footer} fixed>
          <Text>{[d.shop.address, d.shop.phone].filter(Boolean).join(' · ') || 'Motor repair quote'}</Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>

        <Text style={s.title}>Quote {d.number}</Text>
        {d.status === 'DRAFT' && <Text style={s.draft}>DRAFT — not yet sent; figures may change.</Text>}
        <View style={s.cols}>
          <View style={s.col}>
            <Text style={s.h2}>Customer</Text>
            <Row label="Company" value={d.customer.company} />
            <Row label="Contact" value={d.customer.contact} />
            <Row label="Address" value={d.customer.address} />
            <Row label="Phone · email" value={[d.customer.phone, d.customer.email].filter(Boolean).join(' · ') || null} />
          </View>
          <View style={s.col}>
            <Text style={s.h2}>Quote</Text>
            <Row label="Job" value={String(d.jobNumber)} />
            <Row label="Motor" value={d.motor} />
            <Row label="Issued" value={d.issued} />
            <Row label="Valid until" value={d.validUntil} />
            {d.customerPo && <Row label="Your reference" value={d.customerPo} />}
            {d.decision && <Row label="Decision" value={d.decision} />}
          </View>
        </View>

        <Text style={s.h2}>Work and materials</Text>
        <View style={[s.trow, s.thead]} fixed>
          <Text style={s.cKind}>Kind</Text>
          <Text style={s.cDesc}>Description</Text>
          <Text style={s.cQty}>Quantity</Text>
          <Text style={s.cPrice}>Unit price</Text>
          <Text style={s.cTax}>Tax</Text>
          <Text style={s.cAmt}>Amount</Text>
        </View>
        {d.lines.map((l, i) => (
          <View key={i} style={s.trow} wrap={false}>
            <Text style={s.cKind}>{l.kind}</Text>
            <Text style={s.cDesc}>
              {l.description}
              {l.reference ? ` — ${l.reference}` : ''}
            </Text>
            <Text style={s.cQty}>{l.quantity}</Text>
            <Text style={s.cPrice}>{l.unitPrice}</Text>
            <Text style={s.cTax}>{l.taxRate}</Text>
            <Text style={s.cAmt}>{l.amount}</Text>
          </View>
        ))}
        <View style={s.totals} wrap={false}>
          {d.totals.map((t) => (
            <View key={t.label} style={s.trowTotal}>
              <Text style={t.strong ? s.strong : {}}>{t.label}</Text>
              <Text style={t.strong ? s.strong : {}}>{t.value}</Text>
            </View>
          ))}
        </View>
        {d.notes && (
          <>
            <Text style={s.h2}>Notes</Text>
            <Text>{d.notes}</Text>
          </>
        )}

        <Text style={s.h2}>Terms</Text>
        <Text>{d.terms}</Text>

        <Text style={s.h2}>Safety</Text>
        {d.notices.map((n) => (
          <Text key={n.id} style={s.notice}>
            ⚠ {n.title}: {n.text}
          </Text>
        ))}
        <Text style={s.muted}>{d.closing}</Text>

        <View style={s.sign} wrap={false}>
          <View style={s.signBox}>
            <Text>Accepted for the customer (name, signature, date)</Text>
          </View>
          <View style={s.signBox}>
            <Text>Customer order number</Text>
          </View>
        </View>
      </Page>
    </Document>
  );
}

export async function renderQuotePdf(d: QuoteDocument): Promise<Buffer> {
  registerFonts();
  return renderToBuffer(<QuotePdfDocument d={d} />);
}
