// Waits for something another process does (a job worker, a server): reads every 250 ms until
// the answer is truthy, or fails naming what did not happen.
export async function until<T>(what: string, read: () => Promise<T | null | undefined | false>, timeoutMs = 90_000): Promise<T> {
  const started = Date.now();
  for (;;) {
    const value = await read();
    if (value) return value;
    if (Date.now() - started > timeoutMs) throw new Error(`${what} did not happen within ${timeoutMs / 1000} s`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}
