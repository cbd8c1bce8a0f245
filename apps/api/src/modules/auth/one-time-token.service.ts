import { Injectable } from '@nestjs/common';
import { type Executor } from '../../database/database.js';
import { type OneTimeTokenPurpose } from '../../database/schema/index.js';
import { AuthRepository } from './auth.repository.js';
import { hashToken, newOpaqueToken } from './token-hash.js';

export const inviteValidDays = 7;
export const resetValidMinutes = 60;

const lifetimeMs: Record<OneTimeTokenPurpose, number> = {
  invite: inviteValidDays * 24 * 60 * 60 * 1000,
  password_reset: resetValidMinutes * 60 * 1000,
};

/** Single-use links for invitations and password resets. */
@Injectable()
export class OneTimeTokenService {
  constructor(private readonly repository: AuthRepository) {}

  /** Returns the token for the link; only its hash is stored. */
  async issue(userId: string, purpose: OneTimeTokenPurpose, executor?: Executor): Promise<string> {
    const token = newOpaqueToken();
    await this.repository.retireOneTimeTokens(userId, purpose, executor);
    await this.repository.insertOneTimeToken({ userId, purpose, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + lifetimeMs[purpose]) }, executor);
    return token;
  }

  consume(token: string, purpose: OneTimeTokenPurpose, executor: Executor) {
    return this.repository.consumeOneTimeToken(hashToken(token), purpose, executor);
  }
}
