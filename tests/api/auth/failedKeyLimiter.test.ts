import { describe, expect, it } from 'vitest';
import { failedKeyLimiter } from '../../../api/auth/failedKeyLimiter.ts';

describe('failedKeyLimiter', () => {
  it('allows the limit, then asks the address to wait until its oldest failure leaves the window', () => {
    let nowMs = 1_000_000;
    const limiter = failedKeyLimiter({ limit: 3, windowS: 60, now: () => nowMs });
    for (let i = 0; i < 3; i++) {
      expect(limiter.retryAfterS('10.0.0.7')).toBe(0);
      limiter.recordFailure('10.0.0.7');
      nowMs += 10_000;
    }
    // Failures at 0, 10 and 20 s; now 30 s: the first leaves the window at 60 s.
    expect(limiter.retryAfterS('10.0.0.7')).toBe(30);
    expect(limiter.retryAfterS('10.0.0.8')).toBe(0);
    nowMs += 30_001;
    expect(limiter.retryAfterS('10.0.0.7')).toBe(0);
  });

  it('keeps at most the limit of timestamps per address and forgets idle addresses under a scan', () => {
    let nowMs = 0;
    const limiter = failedKeyLimiter({ limit: 2, windowS: 1, now: () => nowMs });
    for (let i = 0; i < 10_050; i++) limiter.recordFailure(`198.51.100.${i}`);
    nowMs = 5_000;
    limiter.recordFailure('203.0.113.1');
    expect(limiter.retryAfterS('198.51.100.1')).toBe(0);
  });
});
