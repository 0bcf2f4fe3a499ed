import { Worker } from 'node:worker_threads';
import { scanReturnsSplit, scanGroup, type ScanGroupTask } from '/work/wt/scale/src/core/returns/splitScan';
import { sharedSymbols } from '/work/wt/scale/src/cli/scanThreads';
import { parseSourceSpec } from '/work/wt/scale/src/core/sources/catalog';
const x = sharedSymbols(parseSourceSpec('coin').generate(2e6, 1).symbols);
const api = import.meta.resolve('tsx/esm/api');
const code = `import(${JSON.stringify(api)}).then((m) => { m.register(); return import('/work/wt/scale/src/core/returns/splitScan.ts'); }).then((s) => { const { parentPort } = require('node:worker_threads'); parentPort.on('message', (t) => { const a = performance.now(); s.scanGroup(t); parentPort.postMessage(performance.now() - a); }); parentPort.postMessage('ready'); });`;
let tasks: ScanGroupTask[] = [];
await scanReturnsSplit(x, 2, { maxN: 40 }, 2, (t) => { tasks = t.map((k) => ({ ...k, order: k.order.slice(), words: k.words.slice() })); return t.map((k) => scanGroup(k)); });
for (const k of tasks) {
  const a = performance.now();
  scanGroup({ ...k, order: k.order.slice(), words: k.words.slice() });
  console.log('main thread group', (performance.now() - a).toFixed(0), 'ms, entries', k.order.length);
}
for (const k of tasks) {
  const w = new Worker(code, { eval: true });
  await new Promise((r) => w.once('message', r));
  const ms = await new Promise((r) => { w.once('message', r); w.postMessage(k); });
  console.log('worker group', Number(ms).toFixed(0), 'ms');
  await w.terminate();
}
