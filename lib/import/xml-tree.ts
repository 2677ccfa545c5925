/**
 * A small, safe XML reader for imports: refuses any document type declaration or entity
 * declaration in the raw text before parsing (so no entity is ever expanded), then parses with
 * fast-xml-parser (entity processing off) into a plain tree that keeps the order of child elements.
 */
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import iconv from 'iconv-lite';

/** One element: its local name (namespace prefix removed), attributes, child elements and text. */
export interface XmlNode {
  name: string;
  attrs: Record<string, string>;
  children: XmlNode[];
  /** Text directly inside the element, trimmed; '' when there is none. */
  text: string;
}

/** A refused or unreadable document, with the HTTP status it maps to and a sentence a person can act on. */
export class XmlReadError extends Error {
  constructor(
    readonly status: number,
    message: string,
  ) {
    super(message);
    this.name = 'XmlReadError';
  }
}

/** Deepest element nesting accepted; LandXML needs fewer than ten levels. */
export const MAX_XML_DEPTH = 64;

const tooDeep = () => new XmlReadError(422, `The file nests elements more than ${MAX_XML_DEPTH} levels deep; it is not a LandXML file this import can read.`);

const DECLARATION = /<!\s*(DOCTYPE|ENTITY)/i;

/**
 * True when the raw text carries a document type or entity declaration. Checked on the raw text,
 * before any parser sees it: such files are refused outright (no entity expansion at all).
 */
export function hasDtdOrEntity(text: string): boolean {
  return DECLARATION.test(text);
}

const PREDEFINED: Record<string, string> = { lt: '<', gt: '>', amp: '&', quot: '"', apos: "'" };

/**
 * Decodes the five predefined XML entities and numeric character references only; anything else
 * stays as written (the parser runs with entity processing off, and declared entities are refused).
 */
export function decodeXmlText(value: string): string {
  return value.replace(/&(#x[0-9a-f]+|#[0-9]+|lt|gt|amp|quot|apos);/gi, (whole, ref: string) => {
    if (ref[0] === '#') {
      const code = ref[1] === 'x' || ref[1] === 'X' ? parseInt(ref.slice(2), 16) : parseInt(ref.slice(1), 10);
      return Number.isFinite(code) && code > 0 && code <= 0x10ffff ? String.fromCodePoint(code) : whole;
    }
    return PREDEFINED[ref.toLowerCase()] ?? whole;
  });
}

type OrderedItem = Record<string, unknown> & { ':@'?: Record<string, string> };

function toNode(name: string, item: OrderedItem, depth: number): XmlNode {
  if (depth > MAX_XML_DEPTH) throw tooDeep();
  const attrs: Record<string, string> = {};
  for (const [k, v] of Object.entries(item[':@'] ?? {})) attrs[k] = decodeXmlText(String(v));
  const node: XmlNode = { name, attrs, children: [], text: '' };
  const content = item[name];
  const texts: string[] = [];
  if (Array.isArray(content)) {
    for (const child of content as OrderedItem[]) {
      const key = Object.keys(child).find((k) => k !== ':@');
      if (!key) continue;
      if (key === '#text') texts.push(String(child['#text']));
      else if (key.startsWith('?') || key === '#comment') continue;
      else node.children.push(toNode(key, child, depth + 1));
    }
  }
  node.text = decodeXmlText(texts.join(' ').trim());
  return node;
}

/**
 * Parses XML text into its root element. Throws {@link XmlReadError}: 400 for a DOCTYPE or ENTITY
 * declaration (checked first, on the raw text) and for text that is not well-formed XML.
 */
export function readXml(text: string): XmlNode {
  if (hasDtdOrEntity(text)) {
    throw new XmlReadError(400, 'The file carries a DOCTYPE or ENTITY declaration. Chordline does not read those in imports; export the LandXML file again without them.');
  }
  const body = text.replace(/^\uFEFF/, '');
  const valid = XMLValidator.validate(body);
  if (valid !== true) {
    const { msg, line } = valid.err;
    throw new XmlReadError(400, `The file is not well-formed XML (line ${line}: ${msg}).`);
  }
  const parser = new XMLParser({
    preserveOrder: true,
    ignoreAttributes: false,
    attributeNamePrefix: '',
    removeNSPrefix: true,
    processEntities: false,
    htmlEntities: false,
    parseTagValue: false,
    parseAttributeValue: false,
    trimValues: true,
    ignoreDeclaration: true,
    ignorePiTags: true,
    maxNestedTags: MAX_XML_DEPTH,
  });
  let items: OrderedItem[];
  try {
    items = parser.parse(body) as OrderedItem[];
  } catch (err) {
    if (/nested/i.test((err as Error).message)) throw tooDeep();
    throw new XmlReadError(400, 'The file could not be read as XML.');
  }
  const roots = items
    .map((item) => Object.keys(item).find((k) => k !== ':@' && k !== '#text' && k !== '#comment' && !k.startsWith('?')))
    .map((key, i) => (key ? toNode(key, items[i], 1) : null))
    .filter((n): n is XmlNode => n !== null);
  if (roots.length !== 1) throw new XmlReadError(400, 'The file is not well-formed XML (it needs exactly one root element).');
  return roots[0];
}

/** Child elements of `node` with local name `name`, in document order. */
export function childrenNamed(node: XmlNode, name: string): XmlNode[] {
  return node.children.filter((c) => c.name === name);
}

/** The first child element named `name`, or undefined. */
export function childNamed(node: XmlNode, name: string): XmlNode | undefined {
  return node.children.find((c) => c.name === name);
}

const DECLARED_ENCODING = /^<\?xml[^>]*?\bencoding\s*=\s*["']([A-Za-z0-9._:-]+)["']/;

/**
 * The encoding an XML file is written in: its byte-order mark, else the byte pattern of "<?" in
 * UTF-16, else the `encoding` of its XML declaration (read as ASCII), else UTF-8 (the XML default).
 */
export function xmlEncodingOf(bytes: Uint8Array): { encoding: string; bom: number; declared: string | null } {
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) return { encoding: 'utf-8', bom: 3, declared: null };
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return { encoding: 'utf-16le', bom: 2, declared: null };
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return { encoding: 'utf-16be', bom: 2, declared: null };
  if (bytes[0] === 0x3c && bytes[1] === 0x00 && bytes[2] === 0x3f && bytes[3] === 0x00) return { encoding: 'utf-16le', bom: 0, declared: null };
  if (bytes[0] === 0x00 && bytes[1] === 0x3c && bytes[2] === 0x00 && bytes[3] === 0x3f) return { encoding: 'utf-16be', bom: 0, declared: null };
  const head = String.fromCharCode(...bytes.subarray(0, 512)).trimStart();
  const declared = DECLARED_ENCODING.exec(head)?.[1] ?? null;
  return { encoding: declared ? declared.toLowerCase() : 'utf-8', bom: 0, declared };
}

/**
 * Decodes the bytes of an uploaded XML file by its byte-order mark or declared encoding
 * (UTF-8, UTF-16, ISO-8859-1, windows-1252 and the other single-byte code pages iconv-lite knows).
 * @throws XmlReadError 415 when the bytes are not text in that encoding, or the encoding is unknown.
 */
export function decodeXmlBytes(bytes: Uint8Array): string {
  const notText = (why: string) => new XmlReadError(415, `The file is not a text XML file (${why}). Choose a LandXML (.xml) file.`);
  const { encoding, bom, declared } = xmlEncodingOf(bytes);
  const body = bytes.subarray(bom);
  let text: string;
  if (encoding === 'utf-8' || encoding === 'utf8' || ((encoding === 'utf-16' || encoding === 'unicode') && bom === 0)) {
    try {
      text = new TextDecoder('utf-8', { fatal: true }).decode(body);
    } catch {
      throw notText(declared ? `it declares ${declared} but is not valid ${declared}` : 'it is not UTF-8 and declares no other encoding in its <?xml ?> line');
    }
  } else if (encoding === 'utf-16le' || encoding === 'utf-16be') {
    try {
      text = new TextDecoder(encoding, { fatal: true }).decode(body);
    } catch {
      throw notText(`it is not valid ${encoding.toUpperCase()}`);
    }
  } else if (iconv.encodingExists(encoding)) {
    text = iconv.decode(Buffer.from(body), encoding);
  } else {
    throw notText(`it declares the encoding "${declared}", which Chordline does not read; save it as UTF-8`);
  }
  if (!/^\uFEFF?\s*</.test(text) || text.includes('\u0000')) throw notText('it does not start with an XML element');
  return text;
}
