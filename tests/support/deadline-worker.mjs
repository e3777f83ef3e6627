// Runs one exported function of a TypeScript module on a worker thread, one input per message, so a test can give up
// on a call that never returns (terminating the worker) instead of hanging the whole suite.
import { parentPort, workerData } from "node:worker_threads";
import { tsImport } from "tsx/esm/api";

const mod = await tsImport(workerData.entry, import.meta.url);
const fn = mod[workerData.exportName];

parentPort.on("message", ({ id, input }) => {
  try {
    parentPort.postMessage({ id, ok: true, output: fn(input) });
  } catch (error) {
    parentPort.postMessage({ id, ok: false, error: `${error?.name ?? "Error"}: ${error?.message ?? String(error)}` });
  }
});
parentPort.postMessage({ ready: true });
