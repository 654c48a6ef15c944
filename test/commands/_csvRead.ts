/**
 * A reader of CSV text written for the tests on its own (not fluxnote's writer): RFC 4180, section 2 — fields
 * separated by `separator`, a field in double quotes may hold the separator, line breaks and doubled quotes.
 * A leading UTF-8 byte-order mark and `#` comment lines before the header are returned apart.
 */
export interface ReadCsv {
  readonly byteOrderMark: boolean;
  readonly comments: readonly string[];
  readonly header: readonly string[];
  readonly rows: readonly (readonly string[])[];
}

export function readCsv(text: string, separator: "," | ";"): ReadCsv {
  const byteOrderMark = text.startsWith("\uFEFF");
  let rest = byteOrderMark ? text.slice(1) : text;
  const comments: string[] = [];
  while (rest.startsWith("#")) {
    const end = rest.indexOf("\n");
    comments.push(rest.slice(0, end));
    rest = rest.slice(end + 1);
  }
  const records: string[][] = [];
  let record: string[] = [];
  let field = "";
  let quoted = false;
  for (let i = 0; i < rest.length; i++) {
    const ch = rest[i]!;
    if (quoted) {
      if (ch === '"' && rest[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"' && field === "") quoted = true;
    else if (ch === separator) {
      record.push(field);
      field = "";
    } else if (ch === "\n") {
      record.push(field);
      records.push(record);
      record = [];
      field = "";
    } else if (ch === '"') throw new Error(`a quote inside an unquoted field at character ${i}`);
    else field += ch;
  }
  if (quoted) throw new Error("unclosed quote");
  if (field !== "" || record.length > 0) throw new Error("the last line has no line end");
  const [header = [], ...rows] = records;
  return { byteOrderMark, comments, header, rows };
}
