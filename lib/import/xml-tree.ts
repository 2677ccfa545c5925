/**
 * A small, safe XML reader for imports: refuses any document type declaration or entity
 * declaration in the raw text before parsing (so no entity is ever expanded), then parses with
 * fast-xml-parser (entity processing off) into a plain tree that keeps the order of child elements.
 */
import { XMLParser, XMLValidator } from 'fast-xml-parser';

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
