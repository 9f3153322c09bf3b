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
  /** A running benchmark: a promise of its result that also reports each answer as it comes. */
  interface Instance extends Promise<Result> {
    /** `client` is the connection's own object; `ms` the answer's latency. */
    on(
      event: 'response',
      listener: (client: object, statusCode: number, resBytes: number, ms: number) => void,
    ): this;
  }
  function autocannon(options: Options): Instance;
  export default autocannon;
}
