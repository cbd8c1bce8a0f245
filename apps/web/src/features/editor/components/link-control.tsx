import { Button, Group, Popover, Stack, TextInput } from '@mantine/core';
import { isSafeHref } from '@limitbook/editor-schema';
import { RichTextEditor, useRichTextEditorContext } from '@mantine/tiptap';
import { IconLink } from '@tabler/icons-react';
import { useState, type FormEvent } from 'react';

/** Why an address cannot be a link, or null when it can. */
export function linkAddressError(address: string): string | null {
  const value = address.trim();
  if (value === '') return 'Type an address';
  if (/^\s*[a-z][a-z0-9+.-]*script\s*:/i.test(value) || /^\s*(data|vbscript|file)\s*:/i.test(value)) return 'This kind of address is not allowed in a page';
  if (isSafeHref(value)) return null;
  if (isSafeHref(`https://${value}`)) return null;
  return 'Use a web address (https://…), an e-mail (mailto:…) or a path in Limitbook (/standards/…)';
}

/** What is stored for a typed address: a bare host gets https://. */
export function normalizedLinkAddress(address: string): string {
  const value = address.trim();
  return isSafeHref(value) ? value : `https://${value}`;
}

/** Sets or edits the link on the selection; addresses are checked before they reach the page. */
export function LinkControl() {
  const { editor } = useRichTextEditorContext();
  const [opened, setOpened] = useState(false);
  const [address, setAddress] = useState('');
  const [error, setError] = useState<string | null>(null);

  const open = () => {
    setAddress(String(editor?.getAttributes('link').href ?? ''));
    setError(null);
    setOpened(true);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const problem = linkAddressError(address);
    if (problem) return setError(problem);
    const href = normalizedLinkAddress(address);
    const chain = editor?.chain().focus().extendMarkRange('link');
    const applied = chain?.setLink({ href, target: href.startsWith('/') || href.startsWith('#') ? '_self' : '_blank' }).run();
    if (!applied) return setError('This address cannot be used as a link');
    setOpened(false);
  };

  return (
    <Popover opened={opened} onChange={setOpened} position="bottom-start" width={380} shadow="md" trapFocus>
      <Popover.Target>
        <RichTextEditor.Control aria-label="Link" title="Link" active={editor?.isActive('link')} onClick={() => (opened ? setOpened(false) : open())}>
          <IconLink size={16} stroke={1.6} />
        </RichTextEditor.Control>
      </Popover.Target>
      <Popover.Dropdown>
        <form onSubmit={submit} noValidate>
          <Stack gap="xs">
            <TextInput
              label="Link address"
              placeholder="https://www.iso.org/… or /standards/BW-STD-112"
              value={address}
              data-autofocus
              error={error}
              onChange={(event) => {
                setAddress(event.currentTarget.value);
                setError(null);
              }}
            />
            <Group justify="flex-end" gap="xs">
              {editor?.isActive('link') && (
                <Button
                  size="xs"
                  variant="subtle"
                  color="redline"
                  onClick={() => {
                    editor.chain().focus().extendMarkRange('link').unsetLink().run();
                    setOpened(false);
                  }}
                >
                  Remove link
                </Button>
              )}
              <Button size="xs" type="submit">
                Apply
              </Button>
            </Group>
          </Stack>
        </form>
      </Popover.Dropdown>
    </Popover>
  );
}
