interface Operation {
  summary?: string;
  tags?: string[];
  'x-min-role'?: string;
  requestBody?: { content?: Record<string, { schema?: unknown; example?: unknown }> };
  parameters?: { name: string; in: string; required?: boolean; description?: string }[];
}

interface Document {
  info: { title: string; description?: string };
  paths?: Record<string, Record<string, Operation>>;
  components?: { schemas?: Record<string, { example?: unknown }> };
}

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (ch) => `&#${ch.charCodeAt(0)};`);

function exampleOf(doc: Document, op: Operation): unknown {
  const schema = op.requestBody?.content?.['application/json']?.schema as { $ref?: string } | undefined;
  const name = schema?.$ref?.split('/').pop();
  return name ? doc.components?.schemas?.[name]?.example : undefined;
}

/** A self-contained page that lists every operation of the OpenAPI document, grouped by tag. */
export function renderDocsPage(doc: Document): string {
  const groups = new Map<string, string[]>();
  for (const [path, methods] of Object.entries(doc.paths ?? {})) {
    for (const [method, op] of Object.entries(methods)) {
      const tag = op.tags?.[0] ?? 'Service';
      const example = exampleOf(doc, op);
      const params = (op.parameters ?? []).map((p) => `<code>${escapeHtml(p.name)}</code> (${p.in}${p.required ? ', required' : ''})`).join(', ');
      const item = `<li><p><b class="m ${method}">${method.toUpperCase()}</b> <code>${escapeHtml(path)}</code> — ${escapeHtml(op.summary ?? '')}
        <small>${op['x-min-role'] ? `role: ${escapeHtml(op['x-min-role'])}` : 'no key needed'}</small></p>
        ${params ? `<p class="p">Parameters: ${params}</p>` : ''}
        ${example ? `<details><summary>Example body</summary><pre>${escapeHtml(JSON.stringify(example, null, 2))}</pre></details>` : ''}</li>`;
      groups.set(tag, [...(groups.get(tag) ?? []), item]);
    }
  }
  const sections = [...groups].map(([tag, items]) => `<section><h2>${escapeHtml(tag)}</h2><ul>${items.join('')}</ul></section>`).join('');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(doc.info.title)}</title><style>
body{font:15px/1.5 system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem;color:#1d232a}
h1{font-size:1.5rem}h2{font-size:1.15rem;border-bottom:1px solid #ccd;margin-top:2rem}ul{list-style:none;padding:0}
li{margin:.6rem 0;padding:.4rem .6rem;background:#f5f6f8;border-radius:4px}li p{margin:.2rem 0}
.m{display:inline-block;min-width:3.6rem;font-size:.8rem}.get{color:#245}.post{color:#742}small{color:#667;margin-left:.5rem}
pre{background:#fff;padding:.5rem;overflow:auto}.p{font-size:.9rem}</style></head><body>
<h1>${escapeHtml(doc.info.title)}</h1><p>${escapeHtml(doc.info.description ?? '')}</p>
<p>The machine-readable document is at <a href="/openapi.json">/openapi.json</a> (OpenAPI 3.1).</p>${sections}</body></html>`;
}
