/**
 * The bench pack as a PDF (A4 or Letter), rendered on the server with @react-pdf/renderer from the same
 * BenchPackData and diagram shapes the print view uses. Large type for the bench; DejaVu Sans for Δ, →, ·.
 */
import { Document, G, Page, Rect, Circle, Line, Polygon, StyleSheet, Svg, Text, View, renderToBuffer } from '@react-pdf/renderer';
import { registerFonts } from '@/lib/job-sheet/job-sheet-pdf';
import type { ShopDetails } from '@/lib/job-sheet/shop-details';
import type { BenchPackData, Row } from './bench-pack-build';
import { connectionDiagram, type Shape } from './connection-diagram';

const ink = '#111';
const s = StyleSheet.create({
  page: { fontFamily: 'DejaVu', fontSize: 10.5, color: ink, paddingTop: 50, paddingBottom: 40, paddingHorizontal: 34, lineHeight: 1.3 },
  header: {
    position: 'absolute',
    top: 18,
    left: 34,
    right: 34,
    flexDirection: 'row',
    justifyContent: 'space-between',
    borderBottomWidth: 1,
    borderBottomColor: ink,
    paddingBottom: 4,
    fontSize: 10,
  },
  footer: { position: 'absolute', bottom: 16, left: 34, right: 34, flexDirection: 'row', justifyContent: 'space-between', fontSize: 8 },
  title: { fontSize: 17, fontWeight: 'bold', marginBottom: 4 },
  h2: { fontSize: 13, fontWeight: 'bold', marginTop: 10, marginBottom: 4, borderBottomWidth: 1, borderBottomColor: ink, paddingBottom: 2 },
  row: { flexDirection: 'row', marginBottom: 2 },
  label: { width: 130, fontWeight: 'bold' },
  value: { flex: 1 },
  box: { borderWidth: 2, borderColor: ink, padding: 6, marginBottom: 4 },
  bold: { fontWeight: 'bold' },
  small: { fontSize: 9 },
  trow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: '#777', paddingVertical: 2 },
  thead: { flexDirection: 'row', borderBottomWidth: 1.2, borderBottomColor: ink, paddingVertical: 2, fontWeight: 'bold' },
  cell: { flex: 1, paddingRight: 4 },
  circuit: { marginBottom: 3 },
  caution: { marginBottom: 3 },
  sign: { flexDirection: 'row', gap: 14, marginTop: 18 },
  signBox: { flex: 1, borderTopWidth: 1, borderTopColor: ink, paddingTop: 2 },
});

function Rows({ rows }: { rows: Row[] }) {
  return (
    <View>
      {rows.map((r) => (
        <View key={r.label} style={s.row} wrap={false}>
          <Text style={s.label}>{r.label}</Text>
          <Text style={s.value}>{r.value}</Text>
        </View>
      ))}
    </View>
  );
}

function Table({ head, rows, widths }: { head: string[]; rows: string[][]; widths?: number[] }) {
  const w = (i: number) => ({ flex: widths?.[i] ?? 1 });
  return (
    <View>
      <View style={s.thead} fixed>
        {head.map((h, i) => (
          <Text key={h} style={[s.cell, w(i)]}>
            {h}
          </Text>
        ))}
      </View>
      {rows.map((r, k) => (
        <View key={k} style={s.trow} wrap={false}>
          {r.map((c, i) => (
            <Text key={i} style={[s.cell, w(i)]}>
              {c}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

function PdfShape({ shape }: { shape: Shape }) {
  switch (shape.kind) {
    case 'line':
      return (
        <Line
          x1={shape.x1}
          y1={shape.y1}
          x2={shape.x2}
          y2={shape.y2}
          stroke={ink}
          strokeWidth={shape.width}
          {...(shape.dashed ? { strokeDasharray: '4 3' } : {})}
        />
      );
    case 'rect':
      return <Rect x={shape.x} y={shape.y} width={shape.w} height={shape.h} stroke={ink} strokeWidth={shape.width} fill="white" />;
    case 'circle':
      return <Circle cx={shape.cx} cy={shape.cy} r={shape.r} stroke={ink} strokeWidth={1.2} fill={shape.filled ? ink : 'white'} />;
    case 'arrow': {
      const dir = shape.x2 > shape.x1 ? 1 : -1;
      const tip = shape.x2;
      return (
        <G>
          <Line x1={shape.x1} y1={shape.y} x2={tip - dir * 7} y2={shape.y} stroke={ink} strokeWidth={1.8} />
          <Polygon points={`${tip},${shape.y} ${tip - dir * 8},${shape.y - 4} ${tip - dir * 8},${shape.y + 4}`} fill={ink} />
        </G>
      );
    }
    case 'text':
      return (
        <G style={{ fontFamily: 'DejaVu', fontSize: shape.size, fontWeight: shape.bold ? 'bold' : 'normal' }}>
          <Text x={shape.x} y={shape.y} textAnchor={shape.anchor} fill={ink}>
            {shape.text}
          </Text>
        </G>
      );
  }
}

export function BenchPackDocument({ d, shop, paper }: { d: BenchPackData; shop: ShopDetails; paper: 'a4' | 'letter' }) {
  const diagram = connectionDiagram(d.plan, d.leadPlan);
  const basis = d.input.basis;
  return (
    <Document title={d.title} author={shop.name} subject="Winder's bench pack" creator="Coilwright">
      <Page size={paper === 'letter' ? 'LETTER' : 'A4'} style={s.page}>
        <View style={s.header} fixed>
          <Text style={s.bold}>{shop.name}</Text>
          <Text>
            Job {d.input.job.number} · bench pack{basis.kind === 'redesign' ? ` · revision ${basis.revision}` : ' · original winding'}
          </Text>
        </View>
        <View style={s.footer} fixed>
          <Text>Lead marking: {d.leadPlan.standard}</Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>

        <Text style={s.title}>{d.title}</Text>
        <Text>
          {d.input.job.customer} · {d.input.job.motor}
        </Text>
        <View style={[s.box, { marginTop: 6 }]} wrap={false}>
          {basis.kind === 'redesign' && <Text style={s.bold}>⚠ REDESIGNED WINDING: it differs from the original. Wind exactly this.</Text>}
          <Rows rows={d.approval} />
        </View>

        <Text style={s.h2} minPresenceAhead={40}>
          Wind this
        </Text>
        <Rows rows={d.summary} />

        <Text style={s.h2} minPresenceAhead={40}>
          Coil groups round the stator
        </Text>
        <Text style={s.small}>
          S = start of a group (first coil, top side), F = finish. Slots listed start → finish for each coil, in winding order.
        </Text>
        <Table
          head={['No.', 'Group', 'Pole', 'Coils', 'Slots (S → F)', 'Span', 'Turns', 'Sense']}
          widths={[0.45, 0.65, 0.5, 0.55, 2.3, 0.7, 0.9, 1.7]}
          rows={d.groups.map((g) => [String(g.number), g.label, String(g.pole), String(g.coils), g.slots, g.spans, g.turns, g.senseText])}
        />

        <Text style={s.h2} minPresenceAhead={40}>
          Connection
        </Text>
        <Text style={s.bold}>{d.poleConnectionText}</Text>
        <Text style={s.small}>
          Each circuit is written lead to lead, every group entry end first: S·A1·F means in at the start of A1, out at its finish.
        </Text>
        {d.circuits.map((c) => (
          <View key={`${c.phase}-${c.index}`} style={s.circuit} wrap={false}>
            <Text>
              <Text style={s.bold}>
                Circuit {c.phase}-{c.index}
              </Text>{' '}
              ({c.turns} turns): {c.startLead} → {c.path} → {c.finishLead}
            </Text>
            {c.jumpers.length > 0 && <Text style={s.small}>Jumpers: {c.jumpers.join('; ')}</Text>}
          </View>
        ))}
        <Text style={[s.bold, { marginTop: 4 }]}>Supply lines: {d.leadText.lines.join(' · ')}</Text>
        {d.leadText.joints.map((j) => (
          <Text key={j}>{j}</Text>
        ))}

        <View wrap={false} style={{ marginTop: 8 }}>
          <Text style={s.bold}>Connection diagram ({d.leadPlan.standard})</Text>
          <Svg viewBox={`0 0 ${diagram.width} ${diagram.height}`} style={{ width: '100%', height: (diagram.height * 527) / diagram.width }}>
            {diagram.shapes.map((sh, i) => (
              <PdfShape key={i} shape={sh} />
            ))}
          </Svg>
        </View>

        <Text style={s.h2} minPresenceAhead={40}>
          Wire to draw from stock
        </Text>
        <Text>{d.wire.allowanceText}</Text>
        <Table
          head={['Wires in hand', 'Length in the winding', 'Copper', 'Draw (with allowance)', 'On hand']}
          widths={[1.2, 1.2, 1.1, 1.2, 1.5]}
          rows={d.wire.rows.map((r) => [r.label, ...r.values])}
        />
        <Text style={s.bold}>{d.wire.totalText}</Text>

        <View wrap={false}>
          <Text style={s.h2} minPresenceAhead={40}>
            Coil dimensions for the former (estimates)
          </Text>
          <Table
            head={['Coil', 'Straight (slot) length', 'End extension, each end', 'Pitch at mid-slot', 'Mean turn length']}
            widths={[1.5, 1, 1, 1, 1]}
            rows={d.coilRows.map((r) => [r.label, ...r.values])}
          />
          <Text style={s.small}>{d.coilNote}</Text>
        </View>

        <View wrap={false}>
          <Text style={s.h2} minPresenceAhead={40}>
            Insulation
          </Text>
          <Rows rows={d.insulation} />
        </View>

        <Text style={s.h2} minPresenceAhead={40}>
          Cautions
        </Text>
        {d.cautions.map((c) => (
          <Text key={c} style={s.caution}>
            ⚠ {c}
          </Text>
        ))}

        <View style={s.sign} wrap={false}>
          <View style={s.signBox}>
            <Text>Wound by</Text>
            <Text style={s.small}>Date:</Text>
          </View>
          <View style={s.signBox}>
            <Text>Connected and checked by</Text>
            <Text style={s.small}>Date:</Text>
          </View>
        </View>
      </Page>
    </Document>
  );
}

/** The PDF bytes of a bench pack. */
export async function renderBenchPackPdf(d: BenchPackData, shop: ShopDetails, paper: 'a4' | 'letter'): Promise<Buffer> {
  registerFonts();
  return renderToBuffer(<BenchPackDocument d={d} shop={shop} paper={paper} />);
}
