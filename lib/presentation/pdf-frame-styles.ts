/**
 * The frame every printed document shares (job sheet, quote): page margins, the running header and footer,
 * the shop line and the title, in the DejaVu font registered by lib/job-sheet/job-sheet-pdf.tsx.
 */
export const DOCUMENT_INK = '#1d2430';
const ink = DOCUMENT_INK;

export const DOCUMENT_FRAME_STYLES = {
  page: { fontFamily: 'DejaVu', fontSize: 8.5, color: ink, paddingTop: 54, paddingBottom: 44, paddingHorizontal: 36, lineHeight: 1.3 },
  header: {
    position: 'absolute',
    top: 20,
    left: 36,
    right: 36,
    flexDirection: 'row',
    justifyContent: 'space-between',
    borderBottomWidth: 1,
    borderBottomColor: ink,
    paddingBottom: 4,
  },
  footer: {
    position: 'absolute',
    bottom: 18,
    left: 36,
    right: 36,
    flexDirection: 'row',
    justifyContent: 'space-between',
    fontSize: 7,
    color: '#5a6473',
  },
  shop: { fontSize: 12, fontWeight: 'bold' },
  title: { fontSize: 15, fontWeight: 'bold', marginBottom: 6 },
} as const;
