// Splits one line of comma-separated text into fields: double quotes may enclose a field (to hold a
// comma), a doubled quote inside them is a quote, and spaces around unquoted fields are dropped.
import { DomeprintError } from "../errors.js";

/** The fields of one line; `where` names the line in errors (e.g. "readings.csv line 4"). */
export function splitCsvLine(line: string, where: string): string[] {
  const fields: string[] = [];
  let i = 0;
  for (;;) {
    while (line[i] === " " || line[i] === "\t") i++;
    if (line[i] === '"') {
      const { text, end } = quoted(line, i, where);
      fields.push(text);
      i = end;
      while (line[i] === " " || line[i] === "\t") i++;
      if (i < line.length && line[i] !== ",") throw csvError(where, `text after the closing quote of field ${fields.length}`);
    } else {
      const comma = line.indexOf(",", i);
      const end = comma < 0 ? line.length : comma;
      const text = line.slice(i, end).trim();
      if (text.includes('"')) throw csvError(where, `a quote inside unquoted field ${fields.length + 1}; quote the whole field and double the quote ("")`);
      fields.push(text);
      i = end;
    }
    if (i >= line.length) return fields;
    i++; // past the comma
  }
}

function quoted(line: string, start: number, where: string): { text: string; end: number } {
  let text = "";
  let i = start + 1;
  for (;;) {
    const q = line.indexOf('"', i);
    if (q < 0) throw csvError(where, "a quoted field is not closed on its line");
    text += line.slice(i, q);
    if (line[q + 1] === '"') {
      text += '"';
      i = q + 2;
    } else {
      return { text, end: q + 1 };
    }
  }
}

function csvError(where: string, problem: string): DomeprintError {
  return new DomeprintError("E_INPUT", `${where}: ${problem}; allowed: comma-separated fields, each optionally in double quotes`, { input: where, allowed: "comma-separated fields" });
}
