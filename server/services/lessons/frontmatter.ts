/**
 * Reads the YAML frontmatter of a lesson at server start. Lessons use a small,
 * fixed subset of YAML (scalars, quoted strings, lists of scalars, folded `>` text),
 * so the server parses that subset itself instead of depending on a build-time
 * package; the content check asserts this parser agrees with a full YAML parser
 * on every lesson.
 */

export type FrontmatterValue = string | number | boolean | null | FrontmatterValue[];

export class FrontmatterError extends Error {
  override name = "FrontmatterError";
}

/** The text between the opening and closing `---` lines, or null when there is none. */
export function extractFrontmatter(source: string): string | null {
  const match = /^(?:\uFEFF)?---[ \t]*\r?\n([\s\S]*?)\r?\n---[ \t]*(?:\r?\n|$)/.exec(source);
  return match ? match[1] : null;
}

function stripComment(text: string): string {
  // A comment starts at " #" outside quotes.
  const index = text.search(/\s#/);
  return index >= 0 ? text.slice(0, index) : text;
}

function parseScalar(raw: string): FrontmatterValue {
  const text = raw.trim();
  if (text.startsWith('"')) {
    const end = text.lastIndexOf('"');
    if (end <= 0) throw new FrontmatterError(`Unterminated string: ${text}`);
    return JSON.parse(text.slice(0, end + 1)) as string;
  }
  if (text.startsWith("'")) {
    const end = text.lastIndexOf("'");
    if (end <= 0) throw new FrontmatterError(`Unterminated string: ${text}`);
    return text.slice(1, end).replace(/''/g, "'");
  }
  const plain = stripComment(text).trim();
  if (plain === "" || plain === "~" || plain === "null") return null;
  if (plain === "true") return true;
  if (plain === "false") return false;
  if (/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(plain)) return Number(plain);
  if (plain.startsWith("[") && plain.endsWith("]")) {
    const inner = plain.slice(1, -1).trim();
    return inner === "" ? [] : inner.split(",").map((part) => parseScalar(part));
  }
  return plain;
}

export function parseFrontmatter(text: string): Record<string, FrontmatterValue> {
  const lines = text.split(/\r?\n/);
  const result: Record<string, FrontmatterValue> = {};
  let i = 0;
  while (i < lines.length) {
    const line = lines[i];
    if (/^\s*(#.*)?$/.test(line)) {
      i += 1;
      continue;
    }
    const match = /^([A-Za-z_][\w-]*):(.*)$/.exec(line);
    if (!match) throw new FrontmatterError(`Cannot read frontmatter line ${i + 1}: ${line}`);
    const key = match[1];
    const rawRest = match[2].trim();
    const rest = /^['"]/.test(rawRest) ? rawRest : stripComment(rawRest).trim();
    i += 1;
    if (rest === ">" || rest === ">-" || rest === "|" || rest === "|-") {
      const block: string[] = [];
      while (i < lines.length && (/^\s+\S/.test(lines[i]) || lines[i].trim() === "")) {
        block.push(lines[i].trim());
        i += 1;
      }
      while (block.length && block[block.length - 1] === "") block.pop();
      const joined = rest.startsWith(">") ? block.join(" ").replace(/ {2,}/g, " ") : block.join("\n");
      result[key] = rest.endsWith("-") ? joined : `${joined}\n`;
      continue;
    }
    if (rest === "") {
      const items: FrontmatterValue[] = [];
      while (i < lines.length && /^\s*-\s/.test(lines[i])) {
        let item = lines[i].replace(/^\s*-\s/, "");
        i += 1;
        // A plain list item may continue on more-indented lines.
        while (i < lines.length && /^\s{4,}\S/.test(lines[i]) && !/^\s*-\s/.test(lines[i])) {
          item += ` ${lines[i].trim()}`;
          i += 1;
        }
        items.push(parseScalar(item));
      }
      result[key] = items.length ? items : null;
      continue;
    }
    let value = rest;
    // A plain scalar may continue on indented lines.
    while (i < lines.length && /^\s+\S/.test(lines[i]) && !/^\s*-\s/.test(lines[i]) && !/^['"]/.test(rest)) {
      value += ` ${lines[i].trim()}`;
      i += 1;
    }
    result[key] = parseScalar(value);
  }
  return result;
}
