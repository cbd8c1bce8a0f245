import { AppException } from '../../common/errors/app.exception.js';

export type AuthErrorReason = 'invalid-credentials' | 'deactivated' | 'no-refresh-token' | 'refresh-invalid' | 'reset-link-invalid' | 'invite-link-invalid';

const byReason: Record<AuthErrorReason, () => AppException> = {
  'invalid-credentials': () => new AppException(401, 'UNAUTHENTICATED', 'E-mail or password is incorrect.'),
  deactivated: () => new AppException(403, 'FORBIDDEN', 'This account is deactivated. Ask an admin to reactivate it.'),
  'no-refresh-token': () => new AppException(401, 'UNAUTHENTICATED', 'Sign in to continue.'),
  'refresh-invalid': () => new AppException(401, 'UNAUTHENTICATED', 'Your session has ended. Sign in again.'),
  'reset-link-invalid': () =>
    new AppException(400, 'VALIDATION_FAILED', 'This reset link is invalid, already used or expired.', { token: 'Ask for a new reset link' }),
  'invite-link-invalid': () =>
    new AppException(400, 'VALIDATION_FAILED', 'This invitation link is invalid, already used or expired.', { token: 'Ask an admin to send a new invitation' }),
};

export class AuthException {
  static of(reason: AuthErrorReason): AppException {
    return byReason[reason]();
  }
}
