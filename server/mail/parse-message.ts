/**
 * A small RFC 5322 / MIME reader for the messages nodemailer writes: unfolds headers, decodes
 * RFC 2047 encoded words, walks multipart bodies and decodes base64 / quoted-printable parts,
 * keeping the first text/plain and text/html parts. Attachments are skipped.
 */
export interface ParsedMessage {
  subject: string;
  /** Decoded From header ("" when absent). */
  fromHeader: string;
  text: string;
  html: string | null;
}

type Headers = Map<string, string>;

/** Splits a header block or part into headers and body; the body stays a latin1 byte string. */
function splitEntity(raw: string): { headers: Headers; body: string } {
  const match = /\r?\n\r?\n/.exec(raw);
  const head = match ? raw.slice(0, match.index) : raw;
  const body = match ? raw.slice(match.index + match[0].length) : "";
  const headers: Headers = new Map();
  for (const line of head.replace(/\r?\n[ \t]+/g, " ").split(/\r?\n/)) {
    const colon = line.indexOf(":");
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    if (!headers.has(name)) headers.set(name, line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function decodeBytes(bytes: Buffer, charset: string): string {
  try {
    return new TextDecoder(charset || "utf-8").decode(bytes);
  } catch {
    return bytes.toString("utf8");
  }
}

function decodeQuotedPrintable(s: string, underscoreIsSpace = false): Buffer {
  const text = (underscoreIsSpace ? s.replace(/_/g, " ") : s).replace(/=\r?\n/g, "");
  const out: number[] = [];
  for (let i = 0; i < text.length; i++) {
    const hex = text.slice(i + 1, i + 3);
    if (text[i] === "=" && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      out.push(parseInt(hex, 16));
      i += 2;
    } else out.push(text.charCodeAt(i) & 0xff);
  }
  return Buffer.from(out);
}

/** RFC 2047: =?charset?B|Q?text?= ; whitespace between adjacent encoded words is dropped. */
export function decodeEncodedWords(value: string): string {
  const word = /=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g;
  return value.replace(/\?=\s+=\?/g, "?==?").replace(word, (_all, charset: string, enc: string, data: string) => {
    const bytes = enc.toUpperCase() === "B" ? Buffer.from(data, "base64") : decodeQuotedPrintable(data, true);
    return decodeBytes(bytes, charset.split("*")[0]);
  });
}

/** "text/html; charset=utf-8; boundary="x"" → { type, params }. */
function parseContentType(value: string | undefined): { type: string; params: Record<string, string> } {
  const [type, ...rest] = (value ?? "text/plain").split(";");
  const params: Record<string, string> = {};
  for (const p of rest) {
    const eq = p.indexOf("=");
    if (eq < 0) continue;
    params[p.slice(0, eq).trim().toLowerCase()] = p.slice(eq + 1).trim().replace(/^"(.*)"$/, "$1");
  }
  return { type: type.trim().toLowerCase(), params };
}

function decodeBody(body: string, headers: Headers, charset: string): string {
  const encoding = (headers.get("content-transfer-encoding") ?? "7bit").toLowerCase();
  let bytes: Buffer;
  if (encoding === "base64") bytes = Buffer.from(body.replace(/\s+/g, ""), "base64");
  else if (encoding === "quoted-printable") bytes = decodeQuotedPrintable(body);
  else bytes = Buffer.from(body, "latin1");
  return decodeBytes(bytes, charset).replace(/\r\n/g, "\n");
}

function walk(entity: { headers: Headers; body: string }, found: { text?: string; html?: string }): void {
  const { type, params } = parseContentType(entity.headers.get("content-type"));
  const disposition = (entity.headers.get("content-disposition") ?? "").toLowerCase();
  if (type.startsWith("multipart/") && params.boundary) {
    const sections = entity.body.split(`--${params.boundary}`);
    for (const section of sections.slice(1)) {
      if (section.startsWith("--")) break;
      walk(splitEntity(section.replace(/^\r?\n/, "")), found);
    }
    return;
  }
  if (disposition.startsWith("attachment")) return;
  const decoded = () => decodeBody(entity.body, entity.headers, params.charset ?? "utf-8").replace(/\n$/, "");
  if (type === "text/plain" && found.text === undefined) found.text = decoded();
  else if (type === "text/html" && found.html === undefined) found.html = decoded();
}

/** Parses one raw message as received by the SMTP server. */
export function parseMessage(raw: Buffer): ParsedMessage {
  const root = splitEntity(raw.toString("latin1"));
  const found: { text?: string; html?: string } = {};
  walk(root, found);
  return {
    subject: decodeEncodedWords(root.headers.get("subject") ?? ""),
    fromHeader: decodeEncodedWords(root.headers.get("from") ?? ""),
    text: found.text ?? "",
    html: found.html ?? null,
  };
}
