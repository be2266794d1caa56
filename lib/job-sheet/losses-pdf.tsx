/** The losses statement on the job sheet PDF (same data as the print view). */
import { StyleSheet, Text, View } from '@react-pdf/renderer';
import type { LossStatementResult } from '@/lib/losses/loss-statement-source';

const s = StyleSheet.create({
  h2: {
    fontSize: 10.5,
    fontWeight: 'bold',
    marginTop: 10,
    marginBottom: 4,
    borderBottomWidth: 0.5,
    borderBottomColor: '#999',
    paddingBottom: 2,
  },
  row: { flexDirection: 'row', marginBottom: 1.5 },
  label: { width: 105, color: '#5a6473' },
  value: { flex: 1 },
  bold: { fontWeight: 'bold' },
  muted: { color: '#5a6473', fontSize: 7.5 },
});

export function LossesPdf({ losses }: { losses: LossStatementResult }) {
  const l = losses.statement;
  return (
    <View wrap={false}>
      <Text style={s.h2}>Losses and efficiency after the rewind</Text>
      {!l ? (
        <Text>No statement: {losses.reason}</Text>
      ) : (
        <>
          <Text>{l.statement}</Text>
          {l.findings.map((f) => (
            <Text key={f} style={s.bold}>
              ⚠ {f}
            </Text>
          ))}
          {l.rows.map((r) => (
            <View key={r.label} style={s.row}>
              <Text style={s.label}>{r.label}</Text>
              <Text style={s.value}>{r.value}</Text>
            </View>
          ))}
          {l.assumptions.map((a) => (
            <Text key={a} style={s.muted}>
              {a}
            </Text>
          ))}
        </>
      )}
    </View>
  );
}
