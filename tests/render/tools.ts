// Test helpers around Debian's poppler-utils and PNG decoding: rasterise a PDF, read fonts and text,
// and count differing pixels between two rasters.

import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import pixelmatch from "pixelmatch";
import { PNG } from "pngjs";

export function hasTool(name: string): boolean {
  return !spawnSync(name, ["-v"], { encoding: "utf8" }).error;
}

function withTempDir<T>(work: (dir: string) => T): T {
  const dir = mkdtempSync(join(tmpdir(), "domeprint-render-"));
  try {
    return work(dir);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function run(command: string, args: string[]): string {
  const result = spawnSync(command, args, { encoding: "utf8" });
  if (result.error) throw result.error;
  if (result.status !== 0) throw new Error(`${command} ${args.join(" ")} exited ${result.status}: ${result.stderr}`);
  return result.stdout;
}

/** Runs a poppler tool on the PDF and returns its standard output. */
export function popplerText(tool: "pdffonts" | "pdftotext" | "pdfinfo", pdf: Buffer, args: string[] = []): string {
  return withTempDir((dir) => {
    const file = join(dir, "sheet.pdf");
    writeFileSync(file, pdf);
    return run(tool, [...args, file, ...(tool === "pdftotext" ? ["-"] : [])]);
  });
}

export function rasterisePdf(pdf: Buffer, dpi: number): PNG {
  return withTempDir((dir) => {
    const file = join(dir, "sheet.pdf");
    writeFileSync(file, pdf);
    run("pdftoppm", ["-r", String(dpi), "-png", "-singlefile", file, join(dir, "page")]);
    return PNG.sync.read(readFileSync(join(dir, "page.png")));
  });
}

export function decodePng(png: Buffer): PNG {
  return PNG.sync.read(png);
}

/** The top-left width × height pixels of an image (RGBA rows copied). */
function crop(image: PNG, width: number, height: number): Buffer {
  const out = Buffer.alloc(width * height * 4);
  for (let y = 0; y < height; y++) image.data.copy(out, y * width * 4, y * image.width * 4, (y * image.width + width) * 4);
  return out;
}

/**
 * Share (0–1) of pixels that differ beyond pixelmatch's perceptual threshold, over the area both
 * images cover: poppler rounds the page size in pixels up and resvg to nearest, so they may differ by
 * one row or column; more than that is an error.
 */
export function differingShare(a: PNG, b: PNG, threshold: number): number {
  if (Math.abs(a.width - b.width) > 1 || Math.abs(a.height - b.height) > 1)
    throw new Error(`raster sizes differ: ${a.width}×${a.height} vs ${b.width}×${b.height}`);
  const width = Math.min(a.width, b.width);
  const height = Math.min(a.height, b.height);
  const count = pixelmatch(crop(a, width, height), crop(b, width, height), undefined, width, height, { threshold });
  return count / (width * height);
}

/** Share of pixels that are not paper white: guards comparisons against two blank images agreeing. */
export function inkedShare(image: PNG): number {
  let inked = 0;
  for (let i = 0; i < image.data.length; i += 4) {
    if (image.data[i]! < 240 || image.data[i + 1]! < 240 || image.data[i + 2]! < 240) inked++;
  }
  return inked / (image.width * image.height);
}
