// Times `requests` HTTP calls after a few untimed warm-up ones; the whole body is read each time.
export const WARMUP_REQUESTS = 5;

export async function timedRequests(requests: number, what: string, call: (i: number) => Promise<Response>): Promise<number[]> {
  const timings: number[] = [];
  for (let i = 0; i < requests + WARMUP_REQUESTS; i += 1) {
    const started = performance.now();
    const res = await call(i);
    await res.arrayBuffer();
    if (!res.ok) throw new Error(`${what} failed: ${res.status}`);
    if (i >= WARMUP_REQUESTS) timings.push(performance.now() - started);
  }
  return timings;
}
