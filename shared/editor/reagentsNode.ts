import type { LexicalParseJSON, NodeKey, SerializedLexicalNode, SerializedPartial, Spread } from 'lexical';
import { BlockNode, textOf } from './blockNode';

/**
 * A reagent table on a page, without any React (the server projects pages with this class; the
 * browser subclass in src/features/page-editor/nodes/ReagentsBlockNode.tsx adds the rendering).
 * Hazard notes are whatever the chemist typed: nothing here looks hazards up or adds any.
 *
 * The rows travel as one node property, so the Yjs document holds the whole list as one value:
 * the last writer of a block wins when two people change the same block at the same instant.
 * Rows are never changed in place (setRows takes a new list), which the binding relies on to see
 * a change.
 */
export interface ReagentRow {
  /** Stable id of the row (for lists and for people editing different rows). */
  rowKey: string;
  name: string;
  /** Optional; when given, the browser shows the naming engine's formula and molar mass. */
  smiles: string;
  amount: string;
  unit: string;
  equivalents: string;
  /** The chemist's own hazard notes, e.g. GHS hazard statement codes such as H225. */
  hazards: string;
}

export interface ReagentsFields {
  rows: ReagentRow[];
}

export type SerializedReagentsNode = Spread<ReagentsFields, SerializedLexicalNode>;

export const REAGENTS_NODE_TYPE = 'reagents';

const rowTextFields = ['name', 'smiles', 'amount', 'unit', 'equivalents', 'hazards'] as const;

/** Rows from JSON or from another client are untrusted: anything that is not a row of text is dropped or emptied. */
export function normaliseReagentRows(value: unknown): ReagentRow[] {
  if (!Array.isArray(value)) return [];
  return value
    .filter((row): row is Record<string, unknown> => typeof row === 'object' && row !== null)
    .map((row) => ({
      rowKey: textOf(row.rowKey),
      ...(Object.fromEntries(rowTextFields.map((field) => [field, textOf(row[field])])) as Omit<ReagentRow, 'rowKey'>),
    }));
}

/** One line per reagent, the filled fields only; this is what page text search and the signature hash see. */
export function reagentRowsText(rows: ReagentRow[]): string {
  const lines = rows.map((row) => {
    const parts = [
      row.name || '(unnamed reagent)',
      row.smiles && `SMILES ${row.smiles}`,
      [row.amount, row.unit].filter(Boolean).join(' '),
      row.equivalents && `${row.equivalents} equiv`,
      row.hazards && `hazard notes: ${row.hazards}`,
    ];
    return `- ${parts.filter(Boolean).join('; ')}`;
  });
  return `[reagents]\n${lines.map((line) => `${line}\n`).join('')}`;
}

export class ReagentsNode extends BlockNode<ReagentsFields> {
  __rows: ReagentRow[];

  static getType(): string {
    return REAGENTS_NODE_TYPE;
  }

  static clone(node: ReagentsNode): ReagentsNode {
    return new ReagentsNode({ rows: node.__rows }, node.__key);
  }

  static importJSON(json: SerializedPartial<SerializedReagentsNode>): ReagentsNode {
    return new ReagentsNode().updateFromJSON(json);
  }

  constructor(fields: ReagentsFields = { rows: [] }, key?: NodeKey) {
    super(key);
    this.__rows = fields.rows;
  }

  fields(): ReagentsFields {
    return { rows: normaliseReagentRows(this.getLatest().__rows) };
  }

  setRows(rows: ReagentRow[]): this {
    const writable = this.getWritable();
    writable.__rows = normaliseReagentRows(rows);
    return writable;
  }

  updateFromJSON(json: LexicalParseJSON<SerializedReagentsNode>): this {
    const writable = super.updateFromJSON(json).getWritable();
    writable.__rows = normaliseReagentRows(json.rows);
    return writable;
  }

  getTextContent(): string {
    return reagentRowsText(this.fields().rows);
  }
}

export function $isReagentsNode(node: unknown): node is ReagentsNode {
  return node instanceof ReagentsNode;
}
