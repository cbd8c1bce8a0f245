import { Alert, Anchor, List, Text } from '@mantine/core';
import type { Editor } from '@tiptap/react';
import { IconAlertCircle } from '@tabler/icons-react';
import { useEffect, useMemo, useRef } from 'react';
import { describeDocumentProblems } from '../lib/document-problems';

type Props = { editor: Editor; refused: { message: string; fields: Record<string, string> } };

/** The server's reasons for refusing a save, each with a way to jump to the part concerned. */
export function DocumentProblemsAlert({ editor, refused }: Props) {
  const problems = useMemo(() => describeDocumentProblems(editor.state.doc, refused.fields), [editor, refused]);
  const ref = useRef<HTMLDivElement>(null);
  // The author may be far down the page when the save is refused: bring the reasons into view.
  useEffect(() => {
    ref.current?.scrollIntoView({ block: 'center' });
  }, [refused]);
  const others = Object.entries(refused.fields).filter(([field]) => field !== 'title' && !field.startsWith('document'));

  const show = (position: number) => {
    const node = editor.state.doc.nodeAt(position);
    const chain = editor.chain().focus();
    (node && !node.isText ? chain.setNodeSelection(position) : chain.setTextSelection(position)).scrollIntoView().run();
  };

  return (
    <Alert ref={ref} color="redline" icon={<IconAlertCircle size={18} />} title="The draft was not saved" mb="md" role="alert">
      <Text size="sm" mb={problems.length + others.length > 0 ? 6 : 0}>
        {refused.message}
      </Text>
      {problems.length + others.length > 0 && (
        <List size="sm" spacing={4}>
          {problems.map((problem) => (
            <List.Item key={problem.field}>
              <b>{problem.where}</b>: {problem.message}
              {problem.position !== null && (
                <>
                  {' '}
                  <Anchor component="button" type="button" size="sm" onClick={() => show(problem.position!)}>
                    Show
                  </Anchor>
                </>
              )}
            </List.Item>
          ))}
          {others.map(([field, message]) => (
            <List.Item key={field}>
              <b>{field}</b>: {message}
            </List.Item>
          ))}
        </List>
      )}
    </Alert>
  );
}
