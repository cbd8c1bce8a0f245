import { createHash, randomUUID } from 'node:crypto';
import { type Readable } from 'node:stream';
import { Inject, Injectable, Logger } from '@nestjs/common';
import { type SignedFileQuery, type StoredFile } from '@limitbook/contracts';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { type StoredFileRow } from '../../database/schema/index.js';
import { AuditService } from '../audit/audit.service.js';
import { cleanFileName, contentDisposition } from './content-disposition.js';
import { FILE_STORAGE, type FileStorage, storageKeyFor } from './file-storage.js';
import { FilesException } from './files.exception.js';
import { FilesRepository } from './files.repository.js';
import { FileUrlSigner } from './signed-file-url.js';
import { sniffUpload } from './sniff-upload.js';

export interface UploadedBytes {
  originalname: string;
  buffer: Buffer;
}

export interface ServedFile {
  headers: Record<string, string>;
  stream: Readable;
}

const inlineTypes = new Set(['image/png', 'image/jpeg', 'image/gif', 'image/webp', 'application/pdf']);

/**
 * A served file must never run as a page of this origin: no sniffing, no scripts, no
 * plugins, and a sandbox. PDFs go without `sandbox` because browsers refuse to show a
 * sandboxed PDF at all; `default-src 'none'` still keeps them from loading anything.
 */
function securityHeaders(contentType: string): Record<string, string> {
  const sandbox = contentType === 'application/pdf' ? '' : '; sandbox';
  return {
    'X-Content-Type-Options': 'nosniff',
    'Content-Security-Policy': `default-src 'none'; style-src 'unsafe-inline'${sandbox}`,
    'Cross-Origin-Resource-Policy': 'same-origin',
    'Referrer-Policy': 'no-referrer',
  };
}

const nowSeconds = () => Math.floor(Date.now() / 1000);

@Injectable()
export class FilesService {
  private readonly logger = new Logger(FilesService.name);
  private readonly signer: FileUrlSigner;

  constructor(
    @Inject(APP_CONFIG) config: ResolvedConfig,
    @Inject(FILE_STORAGE) private readonly storage: FileStorage,
    private readonly repository: FilesRepository,
    private readonly audit: AuditService,
  ) {
    this.signer = new FileUrlSigner(config.jwtSecret);
  }

  async upload(user: AuthUser, file: UploadedBytes | undefined): Promise<StoredFile> {
    if (!file) throw FilesException.of('no-file');
    const name = cleanFileName(file.originalname);
    const sniffed = await sniffUpload(name, file.buffer);
    if (!sniffed.ok) throw FilesException.refusedType(sniffed.message);
    const id = randomUUID();
    const storageKey = storageKeyFor(id);
    await this.storage.put(storageKey, file.buffer);
    let row: StoredFileRow;
    try {
      row = await this.repository.insert({
        id,
        name,
        contentType: sniffed.contentType,
        size: file.buffer.length,
        sha256: createHash('sha256').update(file.buffer).digest('hex'),
        storageKey,
        uploadedBy: user.id,
      });
    } catch (error) {
      await this.storage.delete(storageKey).catch((cleanup: unknown) => this.logger.error(`Could not remove ${storageKey}: ${String(cleanup)}`));
      throw error;
    }
    await this.audit.record({ actor: user, action: 'file.uploaded', subjectType: 'file', subjectId: row.id, detail: { name, contentType: row.contentType, size: row.size } });
    return this.toStoredFile(row, { id: user.id, name: user.name, email: user.email }, user.id);
  }

  async serve(id: string, download: boolean): Promise<ServedFile> {
    const row = await this.repository.findById(id);
    if (!row) throw FilesException.of('not-found');
    let stream: Readable;
    try {
      stream = await this.storage.open(row.storageKey);
    } catch {
      throw FilesException.of('missing-bytes');
    }
    const disposition = download || !inlineTypes.has(row.contentType) ? 'attachment' : 'inline';
    return {
      stream,
      headers: {
        'Content-Type': row.contentType === 'text/csv' ? 'text/csv; charset=utf-8' : row.contentType,
        'Content-Length': String(row.size),
        'Content-Disposition': contentDisposition(disposition, row.name),
        'Cache-Control': 'private, max-age=3600',
        ETag: `"${row.sha256}"`,
        ...securityHeaders(row.contentType),
      },
    };
  }

  /** A signed address works while it has not expired and its user is still active. */
  async serveSigned(id: string, query: SignedFileQuery): Promise<ServedFile> {
    if (!this.signer.verify({ fileId: id, userId: query.u, expires: query.exp }, query.sig, nowSeconds())) throw FilesException.of('bad-signature');
    if (!(await this.repository.isActiveUser(query.u))) throw FilesException.of('bad-signature');
    return this.serve(id, query.download === '1');
  }

  /** Signed addresses of the given files for one user, keyed by file id. */
  signedUrls(userId: string, fileIds: Iterable<string>): Record<string, string> {
    const now = nowSeconds();
    const urls: Record<string, string> = {};
    for (const fileId of fileIds) urls[fileId] = this.signer.url(fileId, userId, now);
    return urls;
  }

  private toStoredFile(row: StoredFileRow, uploadedBy: StoredFile['uploadedBy'], viewerId: string): StoredFile {
    return {
      id: row.id,
      name: row.name,
      contentType: row.contentType,
      size: row.size,
      sha256: row.sha256,
      url: `/api/files/${row.id}`,
      signedUrl: this.signer.url(row.id, viewerId, nowSeconds()),
      uploadedBy,
      createdAt: row.createdAt.toISOString(),
    };
  }
}
