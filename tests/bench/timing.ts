/** Wall clock and this process's CPU time of an async task, the median of a few warm runs. */
export interface Timing {
  /** ms, wall clock */
  wall: number;
  /** ms of this process's CPU: on a shared machine, what the work itself costs */
  cpu: number;
}

export async function median(runs: number, fn: () => Promise<unknown>, warm = true): Promise<Timing> {
  if (warm) await fn();
  const times: Timing[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    const cpu = process.cpuUsage();
    await fn();
    const used = process.cpuUsage(cpu);
    times.push({ wall: performance.now() - start, cpu: (used.user + used.system) / 1000 });
  }
  const mid = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  return { wall: mid(times.map((t) => t.wall)), cpu: mid(times.map((t) => t.cpu)) };
}

/** Two tasks measured in turns (a, b, a, b …), so a machine whose load changes treats both alike. */
export async function medianInTurns(runs: number, a: () => Promise<unknown>, b: () => Promise<unknown>): Promise<[Timing, Timing]> {
  await a();
  await b();
  const as: Timing[] = [];
  const bs: Timing[] = [];
  for (let i = 0; i < runs; i++) {
    as.push(await median(1, a, false));
    bs.push(await median(1, b, false));
  }
  const mid = (ts: Timing[]) => ({ wall: ts.map((t) => t.wall).sort((x, y) => x - y)[Math.floor(ts.length / 2)], cpu: ts.map((t) => t.cpu).sort((x, y) => x - y)[Math.floor(ts.length / 2)] });
  return [mid(as), mid(bs)];
}

export const seconds = (t: Timing) => `${(t.wall / 1000).toFixed(2)} s (CPU ${(t.cpu / 1000).toFixed(2)} s)`;
export const ratio = (a: Timing, b: Timing) => `${(a.wall / b.wall).toFixed(1)}× (CPU ${(a.cpu / b.cpu).toFixed(1)}×)`;
