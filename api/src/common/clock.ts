import { Global, Injectable, Module } from '@nestjs/common';

/**
 * What time it is, as one injectable: checkout expiry, cancellation tiers, deadlines and "today"
 * in the studio's zone all read it, so tests can put the studio on any date by overriding it.
 */
@Injectable()
export class Clock {
  now(): Date {
    return new Date();
  }
}

@Global()
@Module({ providers: [Clock], exports: [Clock] })
export class ClockModule {}
