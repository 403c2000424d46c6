// A build worker thread: renders the sheets the main thread sends, one at a time, and reports each outcome.
import { parentPort } from "node:worker_threads";
import { renderOne, type SheetTask } from "./render-one.js";

parentPort!.on("message", (task: SheetTask | null) => {
  if (task === null) {
    parentPort!.close();
    return;
  }
  void renderOne(task).then((outcome) => parentPort!.postMessage(outcome));
});
