// Writes a finished sheet's files atomically: every file goes to a temporary name in the target folder
// first and is renamed into place only when all are written, so a failure never costs a file on disk.

import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, renameSync, rmSync, statSync, writeFileSync } from "node:fs";
import { join } from "node:path";

export interface OutputFile {
  name: string;
  data: Buffer;
}

/**
 * Writes all files or none of them: temporaries are removed if any write fails; renames within one
 * folder are atomic, so a reader sees either the old file or the new one, never a part.
 */
export function writeAtomically(dir: string, files: OutputFile[]): string[] {
  mkdirSync(dir, { recursive: true });
  const tag = `${process.pid}-${randomBytes(4).toString("hex")}`;
  const staged: { temp: string; final: string }[] = [];
  try {
    for (const file of files) {
      const temp = join(dir, `.${file.name}.${tag}.tmp`);
      staged.push({ temp, final: join(dir, file.name) });
      writeFileSync(temp, file.data, { flag: "wx" });
    }
  } catch (e) {
    for (const { temp } of staged) rmSync(temp, { force: true });
    throw e;
  }
  // A target that cannot be replaced (a folder in its place) would stop the renames half-way: check first.
  const blocked = staged.find(({ final }) => existsSync(final) && statSync(final).isDirectory());
  if (blocked) {
    for (const { temp } of staged) rmSync(temp, { force: true });
    throw new Error(`cannot write ${blocked.final}: a folder of that name is in the way`);
  }
  for (const { temp, final } of staged) renameSync(temp, final);
  return staged.map((s) => s.final);
}
