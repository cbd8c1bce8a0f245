import { Controller, Get, Post, Res, StreamableFile, UploadedFile, UseInterceptors } from '@nestjs/common';
import {
  fileQuerySchema,
  idParamSchema,
  signedFileQuerySchema,
  storedFileSchema,
  type FileQuery,
  type SignedFileQuery,
} from '@limitbook/contracts';
import { type Response } from 'express';
import { AnySignedIn, CurrentUser, Public, Roles } from '../../common/auth/access.decorators.js';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { ApiContract } from '../../common/openapi/api-contract.decorator.js';
import { ValidParams, ValidQuery } from '../../common/validation/valid.decorators.js';
import { FilesService, type ServedFile, type UploadedBytes } from './files.service.js';
import { UploadInterceptor } from './upload.interceptor.js';

function send(res: Response, served: ServedFile): StreamableFile {
  res.set(served.headers);
  return new StreamableFile(served.stream);
}

@Controller('files')
export class FilesController {
  constructor(private readonly files: FilesService) {}

  @Post()
  @Roles(...AnySignedIn)
  @UseInterceptors(UploadInterceptor)
  @ApiContract({
    summary: 'Upload a file (multipart/form-data, field `file`): PNG, JPEG, GIF, WebP, PDF or CSV, at most 10 MB',
    description: 'The type is read from the bytes, not the name; a name whose extension disagrees with the bytes is refused with 415.',
    response: storedFileSchema,
    tag: 'Files',
  })
  upload(@CurrentUser() user: AuthUser, @UploadedFile() file: UploadedBytes | undefined) {
    return this.files.upload(user, file);
  }

  @Get(':id')
  @Roles(...AnySignedIn)
  @ApiContract({ summary: 'Download a file with a bearer token', contentType: 'application/octet-stream', tag: 'Files' })
  async get(@ValidParams(idParamSchema) params: { id: string }, @ValidQuery(fileQuerySchema) query: FileQuery, @Res({ passthrough: true }) res: Response) {
    return send(res, await this.files.serve(params.id, query.download === '1'));
  }

  // Public to the guards: the signature in the address is the credential (see FileUrlSigner).
  @Get(':id/signed')
  @Public()
  @ApiContract({
    summary: 'A file by its signed address, for `<img>` and download links (issued in page responses and uploads)',
    contentType: 'application/octet-stream',
    tag: 'Files',
  })
  async getSigned(@ValidParams(idParamSchema) params: { id: string }, @ValidQuery(signedFileQuerySchema) query: SignedFileQuery, @Res({ passthrough: true }) res: Response) {
    return send(res, await this.files.serveSigned(params.id, query));
  }
}
