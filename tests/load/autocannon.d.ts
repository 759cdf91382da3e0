// The part of autocannon 9's API that tests/load/run.ts uses (the package ships no types).
declare module "autocannon" {
  type Request = { method?: string; path?: string; headers?: Record<string, string>; body?: string };
  type Client = {
    setRequests(requests: Request[]): void;
    setBody(body: string): void;
    on(event: "response", listener: (status: number, bytes: number, ms: number) => void): void;
  };
  type Percentiles = { p50: number; p99: number; average: number; max: number };
  export type Result = { requests: { average: number; total: number }; latency: Percentiles; errors: number; timeouts: number; non2xx: number; duration: number };
  type Options = Request & { url: string; connections?: number; duration?: number; pipelining?: number; setupClient?: (client: Client) => void };
  function autocannon(options: Options): Promise<Result>;
  export default autocannon;
}
