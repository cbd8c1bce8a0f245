import { NativeSelect } from '@mantine/core';
import { cautionLevels, type CautionLevel } from '@limitbook/editor-schema';
import { NodeViewContent, NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { IconAlertTriangle, IconInfoCircle, IconAlertOctagon } from '@tabler/icons-react';
import classes from './caution-view.module.css';

const levelLabels: Record<CautionLevel, string> = { caution: 'Caution', warning: 'Warning', note: 'Note' };
const levelIcons = { caution: IconAlertTriangle, warning: IconAlertOctagon, note: IconInfoCircle } as const;

export function CautionView({ node, updateAttributes, editor }: ReactNodeViewProps) {
  const level = (cautionLevels as readonly string[]).includes(node.attrs.level as string) ? (node.attrs.level as CautionLevel) : 'caution';
  const Icon = levelIcons[level];
  return (
    <NodeViewWrapper className={classes.caution} data-level={level}>
      <div className={classes.header} contentEditable={false}>
        <Icon size={18} aria-hidden />
        <NativeSelect
          size="xs"
          aria-label="Callout level"
          disabled={!editor.isEditable}
          value={level}
          data={cautionLevels.map((value) => ({ value, label: levelLabels[value] }))}
          onChange={(event) => updateAttributes({ level: event.currentTarget.value })}
          classNames={{ input: classes.level }}
        />
      </div>
      <NodeViewContent className={classes.content} />
    </NodeViewWrapper>
  );
}
