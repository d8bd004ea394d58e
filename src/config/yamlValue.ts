import {visit, type Document, type LineCounter} from 'yaml';

/** The result of turning a parsed YAML document into plain data. */
export type YamlValue = {ok: true; value: unknown} | {ok: false; line: number; column: number; message: string};

/**
 * `doc.toJS()` without throwing. The yaml library throws when converting an alias whose anchor is not defined
 * before it (`*name`) and when aliases expand to too many nodes (an "alias bomb"); both become a plain problem
 * at the offending alias — the one named in the error, else the first alias — or at the document start when no
 * alias is found. O(nodes).
 */
export function yamlValue(doc: Document, lineCounter: LineCounter): YamlValue {
  try {
    return {ok: true, value: doc.toJS()};
  } catch (e) {
    const text = e instanceof Error ? e.message : String(e);
    const unresolved = /alias.*?:\s*(\S+)\s*$/i.exec(text);
    const excessive = /excessive alias count/i.test(text);
    let at: number | undefined;
    let first: number | undefined;
    visit(doc, {
      Alias(_, node) {
        const start = node.range?.[0];
        if (start === undefined) return;
        if (first === undefined) first = start;
        if (unresolved !== null && !excessive && node.source === unresolved[1]) {
          at = start;
          return visit.BREAK;
        }
      },
    });
    const pos = lineCounter.linePos(at ?? first ?? doc.range?.[0] ?? 0);
    const message = excessive
      ? 'YAML aliases (*name) expand to too many values; write the values out instead of nesting aliases'
      : unresolved !== null
        ? `YAML alias *${unresolved[1]} names no anchor (&${unresolved[1]}) defined before it`
        : `YAML alias cannot be resolved: ${text}`;
    return {ok: false, line: pos.line, column: pos.col, message};
  }
}
