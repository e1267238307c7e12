import type { LexicalParseJSON, NodeKey, SerializedLexicalNode, SerializedPartial, Spread } from 'lexical';
import { BlockNode, textOf } from './blockNode';

/**
 * The page's structure block, without any React: the server registers this class in a headless
 * editor to project pages (text, JSON, structure list); the browser registers the subclass in
 * src/features/page-editor/nodes/StructureBlockNode.tsx, which only adds the rendering. Both use the
 * type `structure` and the same fields, so the Yjs document and the JSON are identical either way.
 *
 * `molfile` is the source of truth; `smiles` travels alongside for search and quick reading;
 * `structureKey` is a stable id (unlike Lexical's per-editor node keys) that attachment embeds
 * use to point at a structure.
 */
export interface StructureFields {
  structureKey: string;
  molfile: string;
  smiles: string;
  label: string;
}

export type SerializedStructureNode = Spread<StructureFields, SerializedLexicalNode>;

export const STRUCTURE_NODE_TYPE = 'structure';

export class StructureNode extends BlockNode<StructureFields> {
  __structureKey: string;
  __molfile: string;
  __smiles: string;
  __label: string;

  static getType(): string {
    return STRUCTURE_NODE_TYPE;
  }

  static clone(node: StructureNode): StructureNode {
    return new StructureNode(node.fields(), node.__key);
  }

  static importJSON(json: SerializedPartial<SerializedStructureNode>): StructureNode {
    return new StructureNode().updateFromJSON(json);
  }

  constructor(fields: StructureFields = { structureKey: '', molfile: '', smiles: '', label: '' }, key?: NodeKey) {
    super(key);
    this.__structureKey = fields.structureKey;
    this.__molfile = fields.molfile;
    this.__smiles = fields.smiles;
    this.__label = fields.label;
  }

  fields(): StructureFields {
    const self = this.getLatest();
    return { structureKey: self.__structureKey, molfile: self.__molfile, smiles: self.__smiles, label: self.__label };
  }

  /** Replaces the structure (after a redraw) and/or its label; the key stays. */
  setStructure(change: Partial<Omit<StructureFields, 'structureKey'>>): this {
    const writable = this.getWritable();
    if (change.molfile !== undefined) writable.__molfile = change.molfile;
    if (change.smiles !== undefined) writable.__smiles = change.smiles;
    if (change.label !== undefined) writable.__label = change.label;
    return writable;
  }

  updateFromJSON(json: LexicalParseJSON<SerializedStructureNode>): this {
    const self = super.updateFromJSON(json);
    const writable = self.getWritable();
    writable.__structureKey = textOf(json.structureKey);
    writable.__molfile = textOf(json.molfile);
    writable.__smiles = textOf(json.smiles);
    writable.__label = textOf(json.label);
    return writable;
  }

  /** Plain-text projection: the label and SMILES, so search finds structures by either. */
  getTextContent(): string {
    const { label, smiles } = this.fields();
    return `[structure${label ? ` ${label}` : ''}: ${smiles}]\n`;
  }
}

export function $isStructureNode(node: unknown): node is StructureNode {
  return node instanceof StructureNode;
}
