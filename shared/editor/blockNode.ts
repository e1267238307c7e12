import { DecoratorNode, type SerializedLexicalNode } from 'lexical';

/** Parsed JSON is untrusted: anything but a string becomes empty. */
export function textOf(value: unknown): string {
  return typeof value === 'string' ? value : '';
}

/**
 * What the page's blocks (structure, attachment embed, reagents) have in common: a whole-line
 * decorator whose JSON is exactly its `fields()`, placed in a div tagged with its type for the
 * browser subclass to render into (and nothing to render on the server). Lexical still wants the
 * static getType/clone/importJSON on every registered class, so those stay with each block.
 */
export abstract class BlockNode<Fields extends object> extends DecoratorNode<unknown> {
  abstract fields(): Fields;

  exportJSON(): SerializedLexicalNode & Fields {
    return { ...super.exportJSON(), ...this.fields() };
  }

  createDOM(): HTMLElement {
    const element = document.createElement('div');
    element.dataset.block = this.getType();
    return element;
  }

  updateDOM(): false {
    return false;
  }

  isInline(): false {
    return false;
  }

  decorate(): unknown {
    return null;
  }
}
