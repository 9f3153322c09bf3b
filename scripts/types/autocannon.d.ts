/** The part of autocannon's API that scripts/bench-load.ts uses (the package ships no types). */
declare module 'autocannon' {
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    headers?: Record<string, string>;
    requests?: { method?: string; path?: string; body?: string }[];
  }
  interface Histogram {
    average: number;
    p50: number;
    p99: number;
    max: number;
  }
  interface Result {
    requests: Histogram;
    latency: Histogram;
    errors: number;
    timeouts: number;
    non2xx: number;
  }
  function autocannon(options: Options): Promise<Result>;
  export default autocannon;
}
