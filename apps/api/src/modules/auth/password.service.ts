import { Injectable } from '@nestjs/common';
import { hash, verify } from '@node-rs/argon2';

/** argon2id with the library's defaults (19 MiB, 2 passes): the OWASP baseline. */
@Injectable()
export class PasswordService {
  private dummyHash: Promise<string> | undefined;

  hash(password: string): Promise<string> {
    return hash(password);
  }

  async verify(passwordHash: string, password: string): Promise<boolean> {
    try {
      return await verify(passwordHash, password);
    } catch {
      return false;
    }
  }

  /** Spends the same time as a real check, so unknown addresses answer no faster than wrong passwords. */
  async verifyAgainstNothing(password: string): Promise<false> {
    this.dummyHash ??= hash('limitbook-timing-equaliser');
    await this.verify(await this.dummyHash, password);
    return false;
  }
}
