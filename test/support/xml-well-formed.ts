/**
 * Problems that make a text not well-formed XML, per the XML 1.0 specification (W3C,
 * section 2.1 "Well-Formed XML Documents" and the productions it cites): one root element,
 * every start tag closed in order, names well formed, attribute values quoted and not
 * repeated, `<` never in attribute values, `&` only in character or entity references.
 * An empty list means well formed (for the subset of XML our plots use: no DOCTYPE, no CDATA).
 */
export function xmlProblems(text: string): string[] {
  const problems: string[] = [];
  const open: string[] = [];
  let roots = 0;
  const name = '[A-Za-z_:][-A-Za-z0-9_:.]*';
  const token = new RegExp(`<\\?[^]*?\\?>|<!--[^]*?-->|</(${name})\\s*>|<(${name})((?:\\s+[^\\s=/>]+\\s*=\\s*(?:"[^"]*"|'[^']*'))*)\\s*(/?)>|<|[^<]+`, 'g');
  for (const match of text.matchAll(token)) {
    const [whole, closing, opening, attributes, selfClosing] = match;
    if (whole.startsWith('<?') || whole.startsWith('<!--')) continue;
    if (whole === '<') {
      problems.push(`stray or malformed tag at offset ${match.index}`);
    } else if (closing !== undefined) {
      const expected = open.pop();
      if (expected !== closing) problems.push(`</${closing}> closes <${expected ?? 'nothing'}> at offset ${match.index}`);
    } else if (opening !== undefined) {
      if (open.length === 0 && ++roots > 1) problems.push(`second root element <${opening}>`);
      const seen = new Set<string>();
      for (const [, key, value] of (attributes ?? '').matchAll(/([^\s=]+)\s*=\s*("[^"]*"|'[^']*')/g)) {
        if (seen.has(key)) problems.push(`attribute ${key} repeated on <${opening}>`);
        seen.add(key);
        if (value.includes('<')) problems.push(`'<' in attribute ${key} of <${opening}>`);
        problems.push(...badAmpersands(value, `attribute ${key}`));
      }
      if (selfClosing !== '/') open.push(opening);
    } else {
      if (open.length === 0 && whole.trim() !== '') problems.push(`text outside the root element at offset ${match.index}`);
      problems.push(...badAmpersands(whole, 'text'));
    }
  }
  if (open.length > 0) problems.push(`unclosed <${open.join('>, <')}>`);
  if (roots === 0) problems.push('no root element');
  return problems;
}

function badAmpersands(text: string, where: string): string[] {
  return [...text.matchAll(/&(?!(?:[A-Za-z_][-A-Za-z0-9_.]*|#[0-9]+|#x[0-9A-Fa-f]+);)/g)].map(() => `bare & in ${where}`);
}
