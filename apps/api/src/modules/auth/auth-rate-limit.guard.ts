import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';

/**
 * Counts attempts per client address and e-mail, so one address cannot hammer many
 * accounts' budgets and one account cannot be locked out from everywhere.
 */
@Injectable()
export class AuthRateLimitGuard extends ThrottlerGuard {
  protected override async getTracker(req: Record<string, unknown>): Promise<string> {
    const body = req.body as { email?: unknown } | undefined;
    const email = typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
    return `${String(req.ip)}|${email}`;
  }
}
