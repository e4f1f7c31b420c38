/** Attribute values: numbers are rounded to 0.01 px, which no screen can tell apart. */
export type Attributes = Record<string, string | number | undefined>;

/** One SVG element as text; `children` are already-built element strings (or escaped text). */
export function element(name: string, attributes: Attributes, ...children: string[]): string {
  const attrs = Object.entries(attributes)
    .filter(([, value]) => value !== undefined)
    .map(([key, value]) => ` ${key}="${escapeXml(typeof value === 'number' ? String(Math.round(value * 100) / 100) : value!)}"`)
    .join('');
  return children.length === 0 ? `<${name}${attrs}/>` : `<${name}${attrs}>${children.join('')}</${name}>`;
}

/** A text element's content, escaped. */
export function text(x: number, y: number, content: string, attributes: Attributes = {}): string {
  return element('text', { x, y, ...attributes }, escapeXml(content));
}

export function escapeXml(value: string): string {
  return value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}
