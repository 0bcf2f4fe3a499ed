import { expose } from 'comlink';

/**
 * Stand-in workers on MessageChannels: the test exposes `api` on one port and the client under test
 * talks to the other, as it would to a real worker. `started` records every worker the client began
 * and whether it was terminated since. `W` is the client's own worker type.
 */
export function fakeWorkers<W>(api: Record<string, unknown>): { start: () => W; started: { terminated: boolean }[] } {
  const started: { terminated: boolean }[] = [];
  const start = (): W => {
    const { port1, port2 } = new MessageChannel();
    expose(api, port2);
    const record = { terminated: false };
    started.push(record);
    return Object.assign(port1, {
      terminate: () => {
        record.terminated = true;
        port1.close();
        port2.close();
      },
    }) as unknown as W;
  };
  return { start, started };
}
