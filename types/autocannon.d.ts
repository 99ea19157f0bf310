// autocannon 9 ships no types; this covers the part scripts/bench-load.ts uses.
declare module "autocannon" {
  type Histogram = { average: number; mean: number; stddev: number; min: number; max: number; p50: number; p90: number; p97_5: number; p99: number; p99_9: number };
  export type Request = {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string | Buffer;
    setupRequest?: (request: Request, context: Record<string, unknown>) => Request | null;
    onResponse?: (status: number, body: string, context: Record<string, unknown>, headers: Record<string, string>) => void;
  };
  export type Client = { setRequests(requests: Request[]): void };
  export type Options = Request & {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    /** Requests a second across all connections (latency then counts from when each request was due). */
    overallRate?: number;
    timeout?: number;
    pipelining?: number;
    title?: string;
    requests?: Request[];
    setupClient?: (client: Client) => void;
  };
  export type Result = {
    title?: string;
    requests: Histogram & { total: number; sent: number };
    latency: Histogram;
    throughput: Histogram;
    duration: number;
    errors: number;
    timeouts: number;
    mismatches: number;
    non2xx: number;
    statusCodeStats: Record<string, { count: number }>;
    "1xx": number;
    "2xx": number;
    "3xx": number;
    "4xx": number;
    "5xx": number;
  };
  export default function autocannon(options: Options): Promise<Result> & { stop(): void };
}
