import { ActionIcon, Badge, Button, Group, Loader, SegmentedControl, Select, Stack, Text, TextInput, Tooltip } from '@mantine/core';
import { maxCaptionLength, type AcceptanceRule } from '@limitbook/editor-schema';
import { isHouseMethodId, type LengthUnit, type MethodSummary } from '@limitbook/contracts';
import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { IconCalculator, IconGripVertical, IconLock, IconTrash } from '@tabler/icons-react';
import { useState } from 'react';
import { useMethods } from '@/components/calculator/api/get-methods';
import { useBlockEvaluation } from '@/components/calculator/use-block-evaluation';
import { hasDefault } from '../lib/input-paths';
import { AcceptanceRuleInput } from './acceptance-rule-input';
import { BlockDefaultsForm } from './block-defaults-form';
import { BlockPreview } from './block-preview';
import classes from './calculator-block-view.module.css';

type Attrs = {
  blockId: string | null;
  method: string;
  methodVersion: number | null;
  unit: LengthUnit;
  defaults: Record<string, unknown>;
  locked: string[];
  acceptance: AcceptanceRule | null;
  caption: string;
};

/** Locks whose default has gone would be refused by the server: they go with it. */
function keptLocks(locked: string[], defaults: Record<string, unknown>): string[] {
  return locked.filter((path) => hasDefault(defaults, path));
}

export function CalculatorBlockView({ node, updateAttributes, deleteNode, selected, editor }: ReactNodeViewProps) {
  const attrs = node.attrs as Attrs;
  const editable = editor.isEditable;
  const methods = useMethods();
  const method = methods.data?.items.find((item) => item.id === attrs.method);
  const [editing, setEditing] = useState(attrs.method === '');

  const chooseMethod = (id: string | null) => {
    if (!id || id === attrs.method) return;
    // Defaults, locks and the rule belong to a method's inputs and outputs; they do not carry over.
    // An in-house method is pinned to the release picked, so a later version cannot change the page unseen.
    const picked = methods.data?.items.find((item) => item.id === id);
    updateAttributes({ method: id, methodVersion: picked && isHouseMethodId(picked.id) ? picked.version : null, defaults: {}, locked: [], acceptance: null });
  };

  const heading = method?.title ?? (attrs.method ? attrs.method : 'New calculator');

  return (
    <NodeViewWrapper className={classes.block} data-selected={selected || undefined} data-editing={editing || undefined} aria-label={`Calculator: ${heading}`} role="group">
      <header className={classes.header} contentEditable={false}>
        {editable && (
          <span className={classes.grip} data-drag-handle aria-hidden title="Drag to move">
            <IconGripVertical size={16} />
          </span>
        )}
        <IconCalculator size={18} aria-hidden className={classes.icon} />
        <Stack gap={0} className={classes.titles}>
          <Text className={classes.eyebrow}>Calculator</Text>
          <Text className={classes.title}>{heading}</Text>
        </Stack>
        <Group gap={6} wrap="nowrap" className={classes.badges}>
          {attrs.method && (
            <Badge color="gray" tt="none">
              {attrs.unit === 'in' ? 'inch' : 'mm'}
            </Badge>
          )}
          {attrs.locked.length > 0 && (
            <Badge color="ink" leftSection={<IconLock size={11} aria-hidden />}>
              {attrs.locked.length} locked
            </Badge>
          )}
          {attrs.acceptance && <Badge color="verdigris">rule set</Badge>}
        </Group>
        {editable && (
          <Group gap={4} wrap="nowrap">
            <Button size="compact-sm" variant={editing ? 'filled' : 'default'} onClick={() => setEditing((open) => !open)} disabled={!attrs.method && editing}>
              {editing ? 'Done' : 'Edit settings'}
            </Button>
            <Tooltip label="Remove calculator">
              <ActionIcon variant="subtle" color="redline" aria-label="Remove calculator" onClick={() => deleteNode()}>
                <IconTrash size={16} />
              </ActionIcon>
            </Tooltip>
          </Group>
        )}
      </header>

      <div className={classes.body} contentEditable={false}>
        {editing && editable ? (
          <Stack gap="md">
            <Group grow align="flex-start">
              <Select
                label="Method"
                placeholder={methods.isLoading ? 'Loading the catalog…' : 'Pick a method'}
                searchable
                nothingFoundMessage="No method matches"
                data={methodOptions(methods.data?.items ?? [])}
                value={attrs.method || null}
                onChange={chooseMethod}
                error={methods.isError ? 'The method catalog could not be loaded' : attrs.method && methods.isSuccess && !method ? `No method ${attrs.method} in the catalog` : undefined}
                allowDeselect={false}
                comboboxProps={{ withinPortal: true }}
                maw={520}
              />
              <div className={classes.unitField}>
                <Text component="span" size="sm" fw={500} id={`${attrs.blockId}-unit`}>
                  Unit
                </Text>
                <SegmentedControl
                  aria-labelledby={`${attrs.blockId}-unit`}
                  size="sm"
                  value={attrs.unit}
                  data={[
                    { value: 'mm', label: 'mm' },
                    { value: 'in', label: 'inch' },
                  ]}
                  onChange={(unit) => updateAttributes({ unit })}
                />
              </div>
            </Group>
            {!method && captionField(attrs, updateAttributes)}
          </Stack>
        ) : (
          !method && attrs.caption && <Text className={classes.caption}>{attrs.caption}</Text>
        )}
        {method && <ConfiguredBlock key={method.id} method={method} attrs={attrs} editing={editing && editable} updateAttributes={updateAttributes} />}
        {!method && !editing && (
          <Text size="sm" c="dimmed">
            No method chosen yet. Open the settings to pick one.
          </Text>
        )}
        {methods.isLoading && attrs.method && <Loader size="xs" />}
      </div>
    </NodeViewWrapper>
  );
}

function captionField(attrs: Attrs, updateAttributes: ReactNodeViewProps['updateAttributes']) {
  return (
    <TextInput
      label="Caption"
      description="Shown above the calculator and found by search."
      placeholder="e.g. Port P1 to main bore wall"
      maxLength={maxCaptionLength}
      value={attrs.caption}
      onChange={(event) => updateAttributes({ caption: event.currentTarget.value })}
    />
  );
}

type ConfiguredBlockProps = { method: MethodSummary; attrs: Attrs; editing: boolean; updateAttributes: ReactNodeViewProps['updateAttributes'] };

/** Settings and preview of a block whose method is known; mounted per method so no request mixes two methods. */
function ConfiguredBlock({ method, attrs, editing, updateAttributes }: ConfiguredBlockProps) {
  const preview = useBlockEvaluation({ method: method.id, inputs: attrs.defaults, unit: attrs.unit, acceptance: attrs.acceptance }, { debounceMs: 400 });
  return (
    <>
      {editing ? (
        <Stack gap="md" mt="md">
          <Text size="sm" c="dimmed" lineClamp={3}>
            {method.description}
          </Text>
          <section aria-label="Default inputs" className={classes.section}>
            <Text className={classes.sectionTitle}>Default inputs</Text>
            <Text size="xs" c="dimmed" mb={6}>
              What readers start from. The lock beside an input fixes it for readers: they see it but cannot change it.
            </Text>
            <BlockDefaultsForm
              method={method}
              unit={attrs.unit}
              value={attrs.defaults}
              locked={attrs.locked}
              errors={preview.error?.fields ?? {}}
              onChange={(defaults) => updateAttributes({ defaults, locked: keptLocks(attrs.locked, defaults) })}
              onLockedChange={(locked) => updateAttributes({ locked })}
            />
          </section>
          <AcceptanceRuleInput value={attrs.acceptance} outputs={method.outputs} unit={attrs.unit} onChange={(acceptance) => updateAttributes({ acceptance })} />
          {captionField(attrs, updateAttributes)}
        </Stack>
      ) : (
        attrs.caption && <Text className={classes.caption}>{attrs.caption}</Text>
      )}
      <BlockPreview view={preview} method={method} acceptance={attrs.acceptance} />
    </>
  );
}

function methodOptions(items: readonly MethodSummary[]) {
  const inHouse = (item: MethodSummary) => item.source === 'in-house' || isHouseMethodId(item.id);
  const builtIn = items.filter((item) => item.id !== 'formula' && !inHouse(item)).map((item) => ({ value: item.id, label: item.title }));
  const formula = items.filter((item) => item.id === 'formula').map((item) => ({ value: item.id, label: item.title }));
  const house = items.filter(inHouse).map((item) => ({ value: item.id, label: `${item.title} (v${item.version})` }));
  return [
    { group: 'Built-in methods', items: builtIn },
    ...(house.length > 0 ? [{ group: 'In-house methods', items: house }] : []),
    ...(formula.length > 0 ? [{ group: 'In-house formulas', items: formula }] : []),
  ];
}
