/**
 * The job sheet as a PDF, rendered on the server with @react-pdf/renderer from the same JobSheetData the
 * print view uses. DejaVu Sans is embedded because the PDF's standard fonts lack °, ², Ω, Δ, µ, ✓ and ⚠.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Document, Font, Page, StyleSheet, Text, View, renderToBuffer } from '@react-pdf/renderer';
import { checkValueText, overallText, statusText } from '@/lib/final-tests/display';
import type { JobSheetData, Row } from './job-sheet-data';
import { LossesPdf } from './losses-pdf';
import { DOCUMENT_FRAME_STYLES, DOCUMENT_INK } from '@/lib/presentation/pdf-frame-styles';

const FONT_DIR = join(process.cwd(), 'node_modules', 'dejavu-fonts-ttf', 'ttf');
let fontsReady = false;

export function registerFonts(): void {
  if (fontsReady) return;
  const regular = join(FONT_DIR, 'DejaVuSans.ttf');
  if (!existsSync(regular)) throw new Error(`DejaVu fonts not found in ${FONT_DIR}: is the dejavu-fonts-ttf package installed?`);
  Font.register({
    family: 'DejaVu',
    fonts: [
      { src: regular, fontWeight: 'normal' },
      { src: join(FONT_DIR, 'DejaVuSans-Bold.ttf'), fontWeight: 'bold' },
      { src: join(FONT_DIR, 'DejaVuSans-Oblique.ttf'), fontStyle: 'italic' },
    ],
  });
  // Words stay whole: hyphenating part numbers, serials or units would change what they say.
  Font.registerHyphenationCallback((word) => [word]);
  fontsReady = true;
}

const ink = DOCUMENT_INK;
/** A heading needs this much of its section (pt) below it on the page, or it moves to the next page. */
const HEADING_KEEP = 90;
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
  h3: { fontSize: 9, fontWeight: 'bold', marginTop: 6, marginBottom: 2 },
  cols: { flexDirection: 'row', gap: 14 },
  col: { flex: 1 },
  row: { flexDirection: 'row', marginBottom: 1.5 },
  label: { width: 105, color: '#5a6473' },
  value: { flex: 1 },
  verdict: { borderLeftWidth: 3, borderLeftColor: '#9aa4b2', paddingLeft: 5, marginBottom: 4 },
  fail: { borderLeftColor: '#a1261b', borderLeftWidth: 5 },
  pass: { borderLeftColor: '#1f6b3a' },
  bold: { fontWeight: 'bold' },
  muted: { color: '#5a6473' },
  overall: { fontSize: 12, fontWeight: 'bold', marginVertical: 4 },
  redesign: { borderWidth: 1.5, borderColor: ink, padding: 6, marginTop: 2 },
  table: { borderTopWidth: 0.5, borderTopColor: '#999' },
  trow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: '#999', paddingVertical: 2 },
  tcell: { flex: 1, paddingRight: 4 },
  sign: { flexDirection: 'row', gap: 12, marginTop: 14 },
  signBox: { flex: 1, borderTopWidth: 0.8, borderTopColor: ink, paddingTop: 2 },
  notice: { marginBottom: 4 },
  closing: { marginTop: 6, fontWeight: 'bold' },
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

function Tests({ t }: { t: NonNullable<JobSheetData['tests']> }) {
  return (
    <View>
      <Text>
        Record #{t.sequence} · tested {t.testedAt} by {t.testedBy} · instruments {t.instruments}
      </Text>
      <Text style={s.overall}>Overall verdict: {overallText(t.verdict, t.qualifiers)}</Text>
      {t.sections.map((sec) => {
        const readings = t.readings.find((r) => r.key === sec.key);
        return (
          <View key={sec.key} style={[s.verdict, sec.status === 'fail' ? s.fail : sec.status === 'pass' ? s.pass : {}]} wrap={false}>
            <Text style={s.h3}>
              {sec.title}: {statusText(sec.status)}
            </Text>
            {sec.checks.map((c) => (
              <Text key={c.key} style={c.status === 'fail' ? s.bold : {}}>
                {statusText(c.status)} {c.label}
                {c.verdict ? ` · ${checkValueText(c)}` : ''}
                {(c.verdict?.rule ?? c.rule) ? ` — ${c.verdict?.rule ?? c.rule}` : ''}
              </Text>
            ))}
            {sec.warnings.map((w) => (
              <Text key={w}>⚠ Check: {w}</Text>
            ))}
            {readings && <Rows rows={readings.rows} />}
          </View>
        );
      })}
      {t.notes && <Text>Notes: {t.notes}</Text>}
      {t.earlier.length > 0 && (
        <Text style={s.muted}>Earlier records: {t.earlier.map((e) => `#${e.sequence} ${e.testedAt} ${e.verdict}`).join('; ')}</Text>
      )}
    </View>
  );
}

export function JobSheetDocument({ d }: { d: JobSheetData }) {
  return (
    <Document title={`Job sheet ${d.job.number}`} author={d.shop.name} subject="Motor repair job sheet" creator="Coilwright">
      <Page size="A4" style={s.page}>
        <View style={s.header} fixed>
          <Text style={s.shop}>{d.shop.name}</Text>
          <Text>
            Job {d.job.number} · Issue {d.revision} · {d.revisionDate}
          </Text>
        </View>
        <View style={s.footer} fixed>
          <Text>{[d.shop.address, d.shop.phone].filter(Boolean).join(' · ') || 'Motor repair job sheet'}</Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>

        <Text style={s.title}>Motor repair job sheet · job {d.job.number}</Text>
        <View style={s.cols}>
          <View style={s.col}>
            <Text style={s.h2} minPresenceAhead={HEADING_KEEP}>
              Job
            </Text>
            <Rows rows={d.job.rows} />
          </View>
          <View style={s.col}>
            <Text style={s.h2} minPresenceAhead={HEADING_KEEP}>
              Customer
            </Text>
            <Rows rows={d.customer} />
          </View>
        </View>
        <View style={s.cols}>
          <View style={s.col}>
            <Text style={s.h2} minPresenceAhead={HEADING_KEEP}>
              Nameplate as received
            </Text>
            <Rows rows={d.nameplate} />
          </View>
          <View style={s.col}>
            <Text style={s.h2} minPresenceAhead={HEADING_KEEP}>
              As-found winding
            </Text>
            {d.asFound ? (
              <>
                <Text style={s.muted}>
                  From the as-found data sheet, revision {d.asFound.revision}, {d.asFound.updatedAt}
                </Text>
                <Rows rows={d.asFound.rows} />
              </>
            ) : (
              <Text>No as-found winding data was recorded.</Text>
            )}
          </View>
        </View>

        <Text style={s.h2} minPresenceAhead={HEADING_KEEP}>
          Winding as repaired
        </Text>
        <Text style={s.bold}>{d.statementOfWork}</Text>
        {d.redesign ? (
          <View style={s.redesign}>
            <Text style={s.bold}>
              ⚠ REDESIGNED WINDING: differs from the original. Approved redesign revision {d.redesign.revision}, by {d.redesign.approvedBy}{' '}
              on {d.redesign.approvedAt}.
            </Text>
            {d.redesign.note && <Text>Note: {d.redesign.note}</Text>}
            <View style={[s.table, { marginTop: 4 }]}>
              <View style={s.trow}>
                <Text style={[s.tcell, s.bold]}>Item</Text>
                <Text style={[s.tcell, s.bold]}>Original</Text>
                <Text style={[s.tcell, s.bold]}>Redesigned</Text>
              </View>
              {d.redesign.changes.map((c) => (
                <View key={c.label} style={s.trow} wrap={false}>
                  <Text style={s.tcell}>{c.label}</Text>
                  <Text style={s.tcell}>{c.original}</Text>
                  <Text style={s.tcell}>{c.redesigned}</Text>
                </View>
              ))}
            </View>
          </View>
        ) : null}
        {d.asRepaired && (
          <View wrap={false}>
            <Text style={s.h3}>Nameplate as repaired (update the plate or fit a supplementary plate)</Text>
            <Rows rows={d.asRepaired} />
          </View>
        )}
        {d.decisions.length > 0 && (
          <View wrap={false}>
            <Text style={s.h2}>Engineer’s decisions</Text>
            <Rows rows={d.decisions} />
          </View>
        )}

        <Text style={s.h2} minPresenceAhead={HEADING_KEEP}>
          Final tests
        </Text>
        {d.tests && <Text style={s.bold}>Verdicts {d.tests.judgedFor}.</Text>}
        {d.tests && <Text style={s.muted}>Basis: {d.tests.basis}.</Text>}
        {d.tests ? <Tests t={d.tests} /> : <Text>No final tests have been recorded yet.</Text>}
        <LossesPdf losses={d.losses} />

        <View wrap={false}>
          <Text style={s.h2} minPresenceAhead={HEADING_KEEP}>
            Signatures
          </Text>
          <View style={s.sign}>
            {d.signatures.map((label) => (
              <View key={label} style={s.signBox}>
                <Text>{label}</Text>
                <Text style={s.muted}>Date:</Text>
              </View>
            ))}
          </View>
        </View>

        <Text style={s.h2} break>
          Safety notices
        </Text>
        {d.notices.map((n) => (
          <View key={n.id} style={s.notice} wrap={false}>
            <Text style={s.bold}>⚠ {n.title}</Text>
            <Text>{n.text}</Text>
          </View>
        ))}
        <Text style={s.closing}>{d.closing}</Text>
      </Page>
    </Document>
  );
}

/** The PDF bytes of a job sheet. */
export async function renderJobSheetPdf(d: JobSheetData): Promise<Buffer> {
  registerFonts();
  return renderToBuffer(<JobSheetDocument d={d} />);
}
