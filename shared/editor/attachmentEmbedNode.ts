import type { LexicalParseJSON, NodeKey, SerializedLexicalNode, SerializedPartial, Spread } from 'lexical';
import { BlockNode, textOf } from './blockNode';

/**
 * An attached file shown inside the page text (e.g. a spectrum), optionally tied to one of the
 * page's structures by its `structureKey`. React-free for the same reason as StructureNode: the
 * server projects pages with it, the browser subclasses it to render the body through the
 * `embedRenderers.attachment` the page route passes in.
 */
export interface AttachmentEmbedFields {
  attachmentId: string;
  linkedStructureKey: string | null;
}

export type SerializedAttachmentEmbedNode = Spread<AttachmentEmbedFields, SerializedLexicalNode>;

export const ATTACHMENT_EMBED_NODE_TYPE = 'attachment-embed';

export class AttachmentEmbedNode extends BlockNode<AttachmentEmbedFields> {
  __attachmentId: string;
  __linkedStructureKey: string | null;

  static getType(): string {
    return ATTACHMENT_EMBED_NODE_TYPE;
  }

  static clone(node: AttachmentEmbedNode): AttachmentEmbedNode {
    return new AttachmentEmbedNode(node.fields(), node.__key);
  }

  static importJSON(json: SerializedPartial<SerializedAttachmentEmbedNode>): AttachmentEmbedNode {
    return new AttachmentEmbedNode().updateFromJSON(json);
  }

  constructor(fields: AttachmentEmbedFields = { attachmentId: '', linkedStructureKey: null }, key?: NodeKey) {
    super(key);
    this.__attachmentId = fields.attachmentId;
    this.__linkedStructureKey = fields.linkedStructureKey;
  }

  fields(): AttachmentEmbedFields {
    const self = this.getLatest();
    return { attachmentId: self.__attachmentId, linkedStructureKey: self.__linkedStructureKey };
  }

  updateFromJSON(json: LexicalParseJSON<SerializedAttachmentEmbedNode>): this {
    const writable = super.updateFromJSON(json).getWritable();
    writable.__attachmentId = textOf(json.attachmentId);
    writable.__linkedStructureKey = textOf(json.linkedStructureKey) || null;
    return writable;
  }

  getTextContent(): string {
    return `[attachment ${this.fields().attachmentId}]\n`;
  }
}
