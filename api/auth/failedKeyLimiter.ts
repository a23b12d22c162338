export interface FailedKeyLimiter {
  /** Seconds until the address may try again, or 0 when it may now. */
  retryAfterS(address: string): number;
  recordFailure(address: string): void;
}

export interface FailedKeyLimits {
  /** Failed keys an address may present within one window. */
  limit: number;
  windowS: number;
  now?: () => number;
}

// Past this many tracked addresses the expired ones are dropped, so a scan from many
// addresses cannot grow the map without bound.
const PRUNE_ABOVE = 10_000;

/**
 * An in-memory limit on wrong keys per client address (sliding window). Keys are 256-bit random
 * secrets, so guessing cannot succeed; the limit stops scanners from costing a database query per
 * guess and filling the logs. While an address is limited even a right key is turned away, or the
 * limit would tell a guesser when a guess was right. Per process: restarting the service clears it.
 */
export function failedKeyLimiter({ limit, windowS, now = Date.now }: FailedKeyLimits): FailedKeyLimiter {
  const failures = new Map<string, number[]>();
  const windowMs = windowS * 1000;
  const recent = (address: string, at: number) => (failures.get(address) ?? []).filter((t) => t > at - windowMs);
  return {
    retryAfterS(address) {
      const at = now();
      const times = recent(address, at);
      if (times.length < limit) return 0;
      return Math.max(1, Math.ceil((times[times.length - limit]! + windowMs - at) / 1000));
    },
    recordFailure(address) {
      const at = now();
      if (failures.size > PRUNE_ABOVE) for (const key of failures.keys()) if (recent(key, at).length === 0) failures.delete(key);
      failures.set(address, [...recent(address, at), at].slice(-limit));
    },
  };
}
