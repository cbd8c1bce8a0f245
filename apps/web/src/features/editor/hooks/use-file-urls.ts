import { createContext, useContext } from 'react';

/**
 * Signed addresses of uploaded files by id: `<img>` and download links send no bearer
 * token, so the editor shows `/api/files/<id>` through the address the server signed.
 */
export type FileUrls = {
  get: (fileId: string) => string | undefined;
  set: (fileId: string, signedUrl: string) => void;
};

export function createFileUrls(initial: Record<string, string> = {}): FileUrls {
  const urls = new Map(Object.entries(initial));
  return { get: (fileId) => urls.get(fileId), set: (fileId, signedUrl) => void urls.set(fileId, signedUrl) };
}

export const FileUrlsContext = createContext<FileUrls>(createFileUrls());

export function useFileUrls(): FileUrls {
  return useContext(FileUrlsContext);
}

const ownFileSrc = /^\/api\/files\/([0-9a-f-]{36})$/i;

/** The address to show for an image `src`: the signed one for our own files, else the `src` itself. */
export function displaySrc(src: string, urls: FileUrls): string {
  const fileId = ownFileSrc.exec(src)?.[1];
  return fileId ? (urls.get(fileId) ?? src) : src;
}
