import { stopLexicalPropagation } from 'lexical';
import { useEffect, type RefObject } from 'react';

/** The events the editor's root listens to (Lexical's root element events). */
const editorEvents = ['keydown', 'keyup', 'pointerdown', 'beforeinput', 'input', 'click', 'compositionstart', 'compositionend', 'cut', 'copy', 'paste', 'dragstart', 'dragover', 'drop'];

const isFormControl = (target: EventTarget | null) => target instanceof HTMLInputElement || target instanceof HTMLTextAreaElement || target instanceof HTMLButtonElement;

/**
 * Typing, pasting and clicking in a block's own fields belongs to those fields: the event is
 * marked as handled for Lexical (so the page text does not also take it) but still bubbles, so
 * React's handlers run as usual.
 */
export function useKeepFormEventsFromEditor(ref: RefObject<HTMLElement | null>): void {
  useEffect(() => {
    const element = ref.current;
    if (!element) return;
    const mark = (event: Event) => {
      if (isFormControl(event.target)) stopLexicalPropagation(event);
    };
    for (const name of editorEvents) element.addEventListener(name, mark);
    return () => {
      for (const name of editorEvents) element.removeEventListener(name, mark);
    };
  }, [ref]);
}
