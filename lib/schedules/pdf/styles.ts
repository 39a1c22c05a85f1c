// The schedule's look: paper white, graphite text, one warm accent for risk, tabular figures.
import { StyleSheet } from '@react-pdf/renderer';
import { MONO, SANS } from './fonts';

export const INK = '#25282d';
export const INK_SOFT = '#5d626b';
export const RULE = '#cfd1d4';
export const RULE_SOFT = '#e3e4e6';
export const RISK = '#b5541b';
export const RISK_SOFT = '#f6e3d4';
export const RUN_LINE = '#2d6a96';
export const OK = '#2f6b3a';
export const TREATED = '#b5541b';

export const styles = StyleSheet.create({
  page: { fontFamily: SANS, fontSize: 9, color: INK, paddingTop: 84, paddingBottom: 56, paddingHorizontal: 48, lineHeight: 1.35 },
  header: { position: 'absolute', top: 24, left: 48, right: 48, height: 40, flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', fontSize: 7.5, color: INK_SOFT, borderBottomWidth: 0.5, borderBottomColor: RULE, paddingBottom: 6 },
  headerPractice: { flexDirection: 'row', alignItems: 'center', maxWidth: '45%' },
  headerLogo: { maxHeight: 26, maxWidth: 80, marginRight: 6, objectFit: 'contain' },
  headerPracticeName: { fontSize: 9, fontWeight: 600, color: INK },
  headerFacts: { alignItems: 'flex-end' },
  headerStrong: { fontWeight: 600, color: INK },
  titleBlock: { borderWidth: 0.75, borderColor: INK },
  titleTop: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', padding: 8, borderBottomWidth: 0.75, borderBottomColor: INK },
  titleLogo: { maxHeight: 40, maxWidth: 120, marginRight: 10, objectFit: 'contain' },
  titleRow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE },
  titleCell: { paddingHorizontal: 8, paddingVertical: 5, borderRightWidth: 0.5, borderRightColor: RULE },
  titleLabel: { fontSize: 7, color: INK_SOFT, marginBottom: 1 },
  titleValue: { fontWeight: 500 },
  verdict: { flexDirection: 'row', marginBottom: 4 },
  verdictMark: { width: 72, fontWeight: 600 },
  // placed from the top: an absolute 'bottom' leaves it off the page in this renderer (A4 is 841.89 pt tall, ISO 216)
  footer: { position: 'absolute', top: 800, left: 48, right: 48, flexDirection: 'row', justifyContent: 'space-between', fontSize: 7.5, color: INK_SOFT, borderTopWidth: 0.5, borderTopColor: RULE, paddingTop: 6 },
  watermark: { position: 'absolute', top: 330, left: 0, right: 0, textAlign: 'center', fontSize: 110, fontWeight: 600, color: '#b5541b', opacity: 0.1, transform: 'rotate(-32deg)' },
  h1: { fontSize: 24, fontWeight: 600, lineHeight: 1.2, marginBottom: 6 },
  h2: { fontSize: 13, fontWeight: 600, marginTop: 14, marginBottom: 6 },
  h2Sub: { fontSize: 12, fontWeight: 600, marginTop: 4, marginBottom: 6 },
  h3: { fontSize: 10.5, fontWeight: 600, marginTop: 10, marginBottom: 4 },
  muted: { color: INK_SOFT },
  small: { fontSize: 8 },
  mono: { fontFamily: MONO },
  paragraph: { marginBottom: 5 },
  table: { borderTopWidth: 0.75, borderTopColor: INK, marginBottom: 6 },
  headRow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: INK, paddingVertical: 3 },
  row: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE_SOFT, paddingVertical: 2.5 },
  riskRow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE_SOFT, paddingVertical: 2.5, backgroundColor: RISK_SOFT },
  headCell: { fontWeight: 500, color: INK_SOFT, fontSize: 8, paddingRight: 6 },
  cell: { paddingRight: 6 },
  numCell: { paddingRight: 6, textAlign: 'right' },
  facts: { marginTop: 18, borderTopWidth: 0.75, borderTopColor: INK },
  factRow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 5 },
  factLabel: { width: 120, color: INK_SOFT },
  factValue: { flex: 1, fontWeight: 500 },
  note: { borderLeftWidth: 2, borderLeftColor: RISK, paddingLeft: 8, paddingVertical: 4, marginVertical: 6, backgroundColor: '#fbf4ee' },
  bullet: { flexDirection: 'row', marginBottom: 4 },
  bulletMark: { width: 12, color: INK_SOFT },
  bulletText: { flex: 1 },
});
