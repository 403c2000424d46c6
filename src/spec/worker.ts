// A build worker thread: composes the sheets the main thread sends and keeps them; renders and writes
// them when told to, so a spec fault found while composing stops the build before anything is written.
import { parentPort } from "node:worker_threads";
import type { ComposedSheet } from "../sheet/index.js";
import { composeOne, renderOne, type SheetTask } from "./render-one.js";

type Message = { kind: "compose"; task: SheetTask } | { kind: "render"; index: number } | { kind: "stop" };

const held = new Map<number, { task: SheetTask; sheet: ComposedSheet; ms: number }>();

parentPort!.on("message", (m: Message) => {
  if (m.kind === "stop") {
    parentPort!.close();
    return;
  }
  if (m.kind === "compose") {
    const { sheet, outcome } = composeOne(m.task);
    if (sheet) held.set(m.task.index, { task: m.task, sheet, ms: outcome.ms });
    parentPort!.postMessage({ kind: "composed", outcome });
    return;
  }
  const h = held.get(m.index)!;
  held.delete(m.index);
  void renderOne(h.task, h.sheet, h.ms).then((outcome) => parentPort!.postMessage({ kind: "rendered", outcome }));
});
