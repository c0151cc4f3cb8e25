/** The part of autocannon's API the HTTP bench uses (the package ships no types). */
declare module "autocannon" {
  interface Histogram {
    average: number;
    p50: number;
    p99: number;
    total: number;
  }
  interface Options {
    url: string;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    connections?: number;
    duration?: number;
  }
  interface Result {
    requests: Histogram;
    latency: Histogram;
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
  }
  function autocannon(options: Options): Promise<Result>;
  export default autocannon;
}
