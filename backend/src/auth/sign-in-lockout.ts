import { HttpException, HttpStatus, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash } from 'node:crypto';
import { LessThan, MoreThan, Repository } from 'typeorm';
import { SignInFailure } from './entities/sign-in-failure.entity';

function positiveInt(value: string | undefined, fallback: number): number {
  const n = Number(value);
  return Number.isInteger(n) && n > 0 ? n : fallback;
}

/** Read when used, so the configured values apply (tests set them per app). */
export function lockoutSettings(): { maxFailures: number; windowMs: number } {
  return {
    maxFailures: positiveInt(process.env.SIGN_IN_MAX_FAILURES, 5),
    windowMs: positiveInt(process.env.SIGN_IN_WINDOW_SECONDS, 15 * 60) * 1000,
  };
}

/** The answer while an address is locked: the same for known and unknown addresses. */
export class SignInLockedException extends HttpException {
  constructor(readonly retryAfterSeconds: number) {
    const minutes = Math.ceil(retryAfterSeconds / 60);
    super(
      {
        statusCode: HttpStatus.TOO_MANY_REQUESTS,
        error: 'Too Many Requests',
        message: `Too many failed sign-ins for this e-mail address; try again in ${minutes} minute${minutes === 1 ? '' : 's'}`,
        details: { retryAfterSeconds },
      },
      HttpStatus.TOO_MANY_REQUESTS,
    );
  }
}

/**
 * At most SIGN_IN_MAX_FAILURES (5) failed sign-ins per e-mail address in any
 * SIGN_IN_WINDOW_SECONDS (15 min) sliding window; then every attempt, even with the right
 * password, is refused with 429 until the oldest of those failures leaves the window.
 * A success clears the address's failures.
 *
 * Each attempt is written *before* the password is compared and counted with the others, so
 * concurrent attempts on several instances cannot slip more than the limit through.
 */
@Injectable()
export class SignInLockout {
  constructor(@InjectRepository(SignInFailure) private readonly failures: Repository<SignInFailure>) {}

  static keyOf(email: string): string {
    return createHash('sha256').update(email.trim().toLowerCase()).digest('hex');
  }

  /** Records the attempt as a failure in advance; throws 429 when the address is locked. */
  async begin(email: string): Promise<void> {
    const { maxFailures, windowMs } = lockoutSettings();
    const keyHash = SignInLockout.keyOf(email);
    const now = Date.now();
    const attempt = await this.failures.save(this.failures.create({ keyHash, at: now }));
    const recent = await this.failures.find({ where: { keyHash, at: MoreThan(now - windowMs) }, order: { at: 'DESC' }, select: { id: true, at: true } });
    if (recent.length <= maxFailures) return;
    // Locked: this attempt is not counted; the lock ends when the oldest of the last `maxFailures` leaves the window.
    await this.failures.delete({ id: attempt.id });
    const others = recent.filter((r) => r.id !== attempt.id);
    const edge = others[maxFailures - 1] ?? others[others.length - 1];
    throw new SignInLockedException(Math.max(1, Math.ceil((edge.at + windowMs - now) / 1000)));
  }

  /** The password was right: the address's failures are forgiven. */
  async succeeded(email: string): Promise<void> {
    await this.failures.delete({ keyHash: SignInLockout.keyOf(email) });
  }

  /** The attempt stays counted; failures older than the window are dropped (all addresses). */
  async failed(): Promise<void> {
    await this.failures.delete({ at: LessThan(Date.now() - lockoutSettings().windowMs) });
  }
}
