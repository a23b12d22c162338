// The parts of autocannon (which ships no types) that bench/load.ts uses.
declare module 'autocannon' {
  interface Request {
    method?: string;
    path: string;
    headers?: Record<string, string>;
    body?: string;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    overallRate?: number;
    timeout?: number;
    headers?: Record<string, string>;
    requests?: Request[];
  }
  export interface Result {
    requests: { total: number; average: number };
    errors: number;
    timeouts: number;
    non2xx: number;
    statusCodeStats?: Record<string, { count: number }>;
    latency: Record<string, number>;
  }
  interface Instance {
    on(event: 'response', listener: (client: unknown, statusCode: number, resBytes: number, responseTimeMs: number) => void): void;
    on(event: 'done', listener: (result: Result) => void): void;
    stop(): void;
  }
  function autocannon(options: Options): Instance;
  export default autocannon;
}
