import { maxUploadBytes, uploadTypes, type StoredFile } from '@limitbook/contracts';
import { notifications } from '@mantine/notifications';
import { RichTextEditor, useRichTextEditorContext } from '@mantine/tiptap';
import { useRef, useState, type ReactNode } from 'react';
import { errorMessage } from '@/components/form/server-errors';
import { Loader } from '@mantine/core';
import { uploadFile } from '../api/upload-file';
import { formatBytes } from '../lib/format-bytes';

type Props = {
  label: string;
  icon: ReactNode;
  /** Content types this control takes; the server checks the bytes again. */
  accept: readonly string[];
  onUploaded: (file: StoredFile) => void;
};

const extensionsOf = (accept: readonly string[]) =>
  uploadTypes.filter((type) => accept.includes(type.contentType)).flatMap((type) => type.extensions.map((extension) => `.${extension}`));

/** Why a picked file will not be accepted, before spending an upload on it. */
export function uploadProblem(file: File, accept: readonly string[]): string | null {
  if (file.size > maxUploadBytes) return `${file.name} is ${formatBytes(file.size)}; files can be at most ${formatBytes(maxUploadBytes)}.`;
  const extension = file.name.split('.').pop()?.toLowerCase() ?? '';
  if (!extensionsOf(accept).includes(`.${extension}`)) return `${file.name} is not one of the accepted types (${extensionsOf(accept).join(', ')}).`;
  return null;
}

export function UploadControl({ label, icon, accept, onUploaded }: Props) {
  const { editor } = useRichTextEditorContext();
  const input = useRef<HTMLInputElement>(null);
  const [uploading, setUploading] = useState(false);

  const upload = async (file: File) => {
    const problem = uploadProblem(file, accept);
    if (problem) {
      notifications.show({ color: 'redline', title: 'Not uploaded', message: problem });
      return;
    }
    setUploading(true);
    try {
      onUploaded(await uploadFile(file));
    } catch (error) {
      notifications.show({ color: 'redline', title: `${file.name} was not uploaded`, message: errorMessage(error) });
    } finally {
      setUploading(false);
    }
  };

  return (
    <>
      <RichTextEditor.Control aria-label={label} title={label} disabled={!editor?.isEditable || uploading} onClick={() => input.current?.click()}>
        {uploading ? <Loader size={14} /> : icon}
      </RichTextEditor.Control>
      <input
        ref={input}
        type="file"
        hidden
        data-testid={label}
        accept={[...accept, ...extensionsOf(accept)].join(',')}
        onChange={(event) => {
          const file = event.currentTarget.files?.[0];
          event.currentTarget.value = '';
          if (file) void upload(file);
        }}
      />
    </>
  );
}
