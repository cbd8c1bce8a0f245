import { AppException } from '../../common/errors/app.exception.js';

export type UsersErrorReason = 'not-found' | 'email-taken' | 'self-deactivation' | 'last-admin';

const byReason: Record<UsersErrorReason, () => AppException> = {
  'not-found': () => new AppException(404, 'NOT_FOUND', 'No user with this id.'),
  'email-taken': () => new AppException(409, 'CONFLICT', 'A user with this e-mail already exists.', { email: 'Already in use' }),
  'self-deactivation': () => new AppException(409, 'CONFLICT', 'You cannot deactivate your own account.', { active: 'Ask another admin' }),
  'last-admin': () => new AppException(409, 'CONFLICT', 'Limitbook needs at least one active admin. Make someone else admin first.'),
};

export class UsersException {
  static of(reason: UsersErrorReason): AppException {
    return byReason[reason]();
  }
}
