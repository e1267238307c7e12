import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { COMMAND_PRIORITY_HIGH, DROP_COMMAND } from 'lexical';
import { useEffect, useRef } from 'react';
import { prepareStructure } from '../structure/prepareStructure';
import { insertStructure } from '../structure/structureEdits';
import { isStructureFileName, structureFromFile, StructureTextProblem } from '../structure/structureText';

/** A .mol (or .sdf/.smi) file dropped on the text becomes a structure block; other drops pass. */
export function StructureDropPlugin({ onProblem }: { onProblem: (message: string) => void }) {
  const [editor] = useLexicalComposerContext();
  const report = useRef(onProblem);
  report.current = onProblem;

  useEffect(
    () =>
      editor.registerCommand(
        DROP_COMMAND,
        (event) => {
          const file = [...(event.dataTransfer?.files ?? [])].find((candidate) => isStructureFileName(candidate.name));
          if (!file || !editor.isEditable()) return false;
          event.preventDefault();
          file
            .text()
            .then((text) => prepareStructure(structureFromFile(file.name, text)))
            .then((prepared) => insertStructure(editor, { ...prepared, label: file.name.replace(/\.[^.]+$/, '') }))
            .catch((error: unknown) =>
              report.current(error instanceof StructureTextProblem ? error.message : `"${file.name}" could not be read as a structure.`),
            );
          return true;
        },
        COMMAND_PRIORITY_HIGH,
      ),
    [editor],
  );
  return null;
}
