// The part of autocannon's API the API benchmark uses (the package ships no types).
declare module 'autocannon' {
  interface Options {
    url: string;
    connections?: number;
    amount?: number;
    headers?: Record<string, string>;
  }
  interface Histogram {
    p50: number;
    p99: number;
    average: number;
  }
  interface Result {
    latency: Histogram;
    requests: Histogram;
    non2xx: number;
  }
  export default function autocannon(options: Options): Promise<Result>;
}
