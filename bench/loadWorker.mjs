// Plain JavaScript: worker threads on Node 20 do not inherit the TypeScript loader.
// A separate thread fires the requests so the server's event loop is not also the client's;
// node:http with a keep-alive agent, since fetch here adds its own overhead to every request.
import { Agent, get } from 'node:http';
import { performance } from 'node:perf_hooks';
import { parentPort, workerData } from 'node:worker_threads';

const job = workerData;
const agent = new Agent({ keepAlive: true, maxSockets: job.concurrency });
let issued = 0;
let done = 0;
let failed = 0;
const started = performance.now();
const deadline = started + job.maxMs;

const once = () =>
  new Promise((resolve, reject) => {
    get(job.url, { agent, headers: job.headers }, (res) => {
      res.resume();
      res.on('end', () => resolve(res.statusCode));
    }).on('error', reject);
  });

async function lane() {
  while (issued < job.requests && performance.now() < deadline) {
    issued++;
    if ((await once()) === 200) done++;
    else failed++;
  }
}

await Promise.all(Array.from({ length: job.concurrency }, lane));
agent.destroy();
parentPort.postMessage({ done, failed, seconds: (performance.now() - started) / 1000 });
