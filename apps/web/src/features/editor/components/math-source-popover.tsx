import { Button, Group, Popover, Stack, Text, Textarea } from '@mantine/core';
import { maxLatexLength } from '@limitbook/editor-schema';
import { useState, type ReactNode } from 'react';
import { MathFormula } from './math-formula';
import classes from './math.module.css';

type Props = {
  latex: string;
  displayMode: boolean;
  opened: boolean;
  onOpen: () => void;
  /** Called with the edited source when the popover closes; `null` when the edit was abandoned. */
  onClose: (latex: string | null) => void;
  onRemove: () => void;
  children: ReactNode;
};

/** Edits a formula's LaTeX source in a small popover with a live preview. */
export function MathSourcePopover({ latex, displayMode, opened, onOpen, onClose, onRemove, children }: Props) {
  const [source, setSource] = useState(latex);
  const [wasOpened, setWasOpened] = useState(opened);
  if (opened !== wasOpened) {
    setWasOpened(opened);
    if (opened) setSource(latex);
  }

  return (
    <Popover
      opened={opened}
      onChange={(next) => (next ? onOpen() : onClose(source))}
      onDismiss={() => onClose(source)}
      position="bottom"
      width={420}
      shadow="md"
      trapFocus
      returnFocus
    >
      <Popover.Target>{children}</Popover.Target>
      <Popover.Dropdown>
        <Stack gap="xs">
          <Textarea
            label={displayMode ? 'Block formula (LaTeX)' : 'Inline formula (LaTeX)'}
            placeholder="W_{min} = \frac{D_{LMC} - d_{LMC}}{2} - t"
            autosize
            minRows={2}
            maxRows={8}
            maxLength={maxLatexLength}
            value={source}
            data-autofocus
            classNames={{ input: classes.source }}
            onChange={(event) => setSource(event.currentTarget.value)}
            onKeyDown={(event) => {
              if (event.key === 'Enter' && (event.metaKey || event.ctrlKey)) {
                event.preventDefault();
                onClose(source);
              }
              if (event.key === 'Escape') {
                event.preventDefault();
                onClose(null);
              }
            }}
          />
          <div className={classes.preview} aria-label="Preview">
            <MathFormula latex={source} displayMode={displayMode} placeholder="The preview appears here" />
          </div>
          <Group justify="space-between">
            <Text size="xs" c="dimmed">
              Ctrl+Enter to apply, Esc to cancel
            </Text>
            <Group gap="xs">
              <Button size="xs" variant="subtle" color="redline" onClick={onRemove}>
                Remove
              </Button>
              <Button size="xs" onClick={() => onClose(source)}>
                Done
              </Button>
            </Group>
          </Group>
        </Stack>
      </Popover.Dropdown>
    </Popover>
  );
}
