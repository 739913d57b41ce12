// The sign-in limit (rules in sign-in-policy.ts, counters in sign-in-failures.repository.ts).
// The address is Express's `req.ip`: the socket's peer unless TRUST_PROXY names proxies
// whose X-Forwarded-For may be believed, so a client cannot pick a fresh address per try.
import { Inject, Injectable } from '@nestjs/common';
import { TooManyRequestsException } from '../common/exceptions/too-many-requests.exception.js';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import type { Device } from './device-cookie.js';
import { SignInFailuresRepository, type CountedKey } from './sign-in-failures.repository.js';
import { describeWait } from './sign-in-policy.js';

export interface Attempt {
  account: string;
  address: string;
  device: Device | null;
}

@Injectable()
export class SignInLimiter {
  constructor(
    private readonly failures: SignInFailuresRepository,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Counts the attempt as a failure until `succeeded` says otherwise; throws 429 when it must wait. */
  async admit(attempt: Attempt): Promise<void> {
    const wait = await this.failures.reserve(this.keys(attempt));
    if (wait > 0) {
      throw new TooManyRequestsException(`Too many failed sign-ins; try again in ${describeWait(wait)}`, wait);
    }
  }

  /** A success resets the account's counter (and the device's) and takes back the address's count. */
  async succeeded(attempt: Attempt): Promise<void> {
    const counted = this.keys(attempt).map((k) => k.key);
    const reset = counted.filter((k) => !k.startsWith('address:'));
    if (!reset.includes(`account:${attempt.account}`)) reset.push(`account:${attempt.account}`);
    await this.failures.forgive(reset, counted.filter((k) => k.startsWith('address:')));
  }

  /** The attempt's own counter (account, or device and account) first, then the address's. */
  private keys({ account, address, device }: Attempt): CountedKey[] {
    const growing = { kind: 'growing-delay', freeFailures: this.config.signInFreeFailures } as const;
    if (device?.accounts.includes(account)) return [{ key: `device:${device.id}:${account}`, rule: growing }];
    return [
      { key: `account:${account}`, rule: growing },
      {
        key: `address:${address}`,
        rule: { kind: 'window', limit: this.config.signInAddressLimit, windowSeconds: this.config.signInAddressWindowSeconds },
      },
    ];
  }
}
