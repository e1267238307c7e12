import type { EditorThemeClasses } from 'lexical';

/** How the page's text looks: the sheet's ink on its ruled paper, headings in tide. */
export const editorTheme: EditorThemeClasses = {
  paragraph: 'my-2 leading-7',
  heading: {
    h1: 'mt-6 mb-2 text-2xl font-semibold text-tide-800',
    h2: 'mt-5 mb-2 text-xl font-semibold text-tide-800',
    h3: 'mt-4 mb-1.5 text-base font-semibold uppercase tracking-[0.08em] text-tide-700',
  },
  quote: 'my-3 border-l-4 border-reed-300 bg-reed-100/40 px-4 py-2 text-ink-soft',
  text: {
    bold: 'font-semibold',
    italic: 'italic',
    underline: 'underline',
    strikethrough: 'line-through',
    subscript: 'qn-sub',
    superscript: 'qn-sup',
  },
  link: 'text-tide-700 underline decoration-tide-300 underline-offset-2 hover:decoration-tide-600',
  list: {
    ul: 'my-2 ml-6 list-disc',
    ol: 'my-2 ml-6 list-decimal',
    listitem: 'my-1 pl-1',
    listitemChecked: 'qn-check qn-check-on',
    listitemUnchecked: 'qn-check',
    nested: { listitem: 'list-none' },
    checklist: 'qn-checklist',
  },
  table: 'my-4 w-full border-collapse text-sm',
  tableRow: '',
  tableCell: 'border border-fold-strong px-2 py-1 align-top min-w-16',
  tableCellHeader: 'bg-paper-deep font-semibold',
  tableSelected: 'ring-2 ring-tide-300',
  tableCellSelected: 'bg-tide-50',
};
