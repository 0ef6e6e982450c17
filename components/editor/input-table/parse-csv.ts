export type CsvRecord = {
  /** Line of the file where the record starts, from 1. */
  line: number;
  fields: string[];
};

export type CsvParse = {
  records: CsvRecord[];
  delimiter: string;
  problems: { line: number; reason: string }[];
};

export type ParseCsvOptions = {
  /** Field separator; detected from the first line when not given (comma, semicolon or tab). */
  delimiter?: string;
};

const CANDIDATES = [",", ";", "\t"];

/**
 * RFC 4180 CSV: quoted fields with doubled quotes, separators and line breaks
 * inside quotes, CRLF or LF endings, a leading byte-order mark. Lenient where
 * spreadsheets are: a quote inside an unquoted field is kept as text. Blank
 * lines are not records. A quote left open drops its record and is reported.
 */
export function parseCsv(text: string, options: ParseCsvOptions = {}): CsvParse {
  const src = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const delimiter = options.delimiter ?? detectDelimiter(src);
  const records: CsvRecord[] = [];
  const problems: CsvParse["problems"] = [];

  let line = 1;
  let startLine = 1;
  let fields: string[] = [];
  let field = "";
  let quoted = false;
  let fieldStart = true;

  const endRecord = () => {
    fields.push(field);
    if (!(fields.length === 1 && fields[0].trim() === "")) records.push({ line: startLine, fields });
    fields = [];
    field = "";
    fieldStart = true;
  };

  for (let i = 0; i < src.length; i++) {
    const ch = src[i];
    if (quoted) {
      if (ch === '"') {
        if (src[i + 1] === '"') {
          field += '"';
          i++;
        } else quoted = false;
      } else {
        if (ch === "\n") line++;
        field += ch;
      }
      continue;
    }
    if (ch === '"' && fieldStart) {
      quoted = true;
      fieldStart = false;
    } else if (ch === delimiter) {
      fields.push(field);
      field = "";
      fieldStart = true;
    } else if (ch === "\r" || ch === "\n") {
      if (ch === "\r" && src[i + 1] === "\n") i++;
      endRecord();
      line++;
      startLine = line;
    } else {
      field += ch;
      fieldStart = false;
    }
  }
  if (quoted) {
    problems.push({ line: startLine, reason: `a quoted value opened on line ${startLine} is never closed` });
  } else if (field !== "" || fields.length > 0) {
    endRecord();
  }
  return { records, delimiter, problems };
}

/** The candidate separator that occurs most often, outside quotes, on the first non-blank line. */
export function detectDelimiter(text: string): string {
  const first = text.split(/\r?\n/).find((l) => l.trim() !== "") ?? "";
  let best = ",";
  let bestCount = 0;
  for (const d of CANDIDATES) {
    let count = 0;
    let inQuotes = false;
    for (const ch of first) {
      if (ch === '"') inQuotes = !inQuotes;
      else if (ch === d && !inQuotes) count++;
    }
    if (count > bestCount) {
      best = d;
      bestCount = count;
    }
  }
  return best;
}
