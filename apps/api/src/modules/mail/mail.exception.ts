import { AppException } from '../../common/errors/app.exception.js';

export class MailException extends AppException {
  static notFound(): MailException {
    return new MailException(404, 'NOT_FOUND', 'No captured mail with this id.');
  }
}
