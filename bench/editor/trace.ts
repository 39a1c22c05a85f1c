// Main-thread work per frame from a Chromium performance trace: the sum of the renderer main
// thread's top-level tasks between one animation frame and the next. Unlike the interval
// between frames, this is not rounded up to the display's 60 Hz.
interface TraceEvent { name: string; ph: string; ts: number; dur?: number; pid: number; tid: number; args?: { name?: string } }

export function mainThreadFrameTimesMs(traceJson: Buffer | string): number[] {
  const events = (JSON.parse(traceJson.toString()) as { traceEvents: TraceEvent[] }).traceEvents;
  const mainThreads = events.filter((event) => event.ph === 'M' && event.name === 'thread_name' && event.args?.name === 'CrRendererMain');
  const counts = mainThreads.map((thread) => ({ thread, frames: events.filter((event) => event.pid === thread.pid && event.tid === thread.tid && event.name === 'FireAnimationFrame').length }));
  const main = counts.sort((a, b) => b.frames - a.frames)[0]?.thread;
  if (!main) throw new Error('the trace has no renderer main thread');
  const onMain = events.filter((event) => event.pid === main.pid && event.tid === main.tid && event.ph === 'X');
  const frameStarts = onMain.filter((event) => event.name === 'FireAnimationFrame').map((event) => event.ts).sort((a, b) => a - b);
  const tasks = onMain.filter((event) => event.name === 'ThreadControllerImpl::RunTask' || event.name === 'RunTask');
  const busyUs = new Array<number>(Math.max(0, frameStarts.length - 1)).fill(0);
  for (const task of tasks) {
    // Tasks are counted in the frame where they start (binary search over frame starts).
    let low = 0;
    let high = frameStarts.length - 1;
    if (task.ts < frameStarts[0] || task.ts >= frameStarts[high]) continue;
    while (high - low > 1) {
      const middle = (low + high) >> 1;
      if (frameStarts[middle] <= task.ts) low = middle; else high = middle;
    }
    busyUs[low] += task.dur ?? 0;
  }
  return busyUs.map((us) => us / 1000);
}
