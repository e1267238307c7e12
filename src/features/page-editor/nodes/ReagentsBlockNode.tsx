import type { JSX } from 'react';
import type { SerializedPartial } from 'lexical';
import { ReagentsNode, type ReagentRow, type SerializedReagentsNode } from '../../../../shared/editor';
import { ReagentsBlock } from '../reagents/ReagentsBlock';

/** The reagent table as the browser shows it; fields and type come from shared/editor. */
export class ReagentsBlockNode extends ReagentsNode {
  static getType(): string {
    return ReagentsNode.getType();
  }

  static clone(node: ReagentsBlockNode): ReagentsBlockNode {
    return new ReagentsBlockNode({ rows: node.__rows }, node.__key);
  }

  static importJSON(json: SerializedPartial<SerializedReagentsNode>): ReagentsBlockNode {
    return new ReagentsBlockNode().updateFromJSON(json);
  }

  createDOM(): HTMLElement {
    const element = super.createDOM();
    element.className = 'my-4';
    return element;
  }

  decorate(): JSX.Element {
    return <ReagentsBlock nodeKey={this.getKey()} rows={this.fields().rows} />;
  }
}

export function $createReagentsBlockNode(rows: ReagentRow[]): ReagentsBlockNode {
  return new ReagentsBlockNode({ rows });
}
