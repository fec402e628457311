import type { OpenApiDocument } from '../api/get-openapi-document';

const groups = [
  { name: 'Templates', description: 'Published templates: list, detail, solve, sweep and sensitivity', match: (path: string) => path.startsWith('/templates') },
  { name: 'Specs', description: 'Check and solve a template spec kept in your own repository (scope author)', match: (path: string) => path.startsWith('/specs') },
  { name: 'Reference', description: 'Machine-readable descriptions, no key needed', match: () => true },
];

/**
 * The document with each operation under a group by its path, so the viewer shows three
 * headed sections instead of one "default" list. Operations that already name tags keep them.
 */
export function groupOperations(doc: OpenApiDocument): OpenApiDocument {
  const paths: OpenApiDocument['paths'] = {};
  for (const [path, item] of Object.entries(doc.paths)) {
    const group = groups.find((g) => g.match(path))!;
    paths[path] = Object.fromEntries(
      Object.entries(item).map(([method, op]) => {
        if (typeof op !== 'object' || op === null || Array.isArray(op) || 'tags' in op) return [method, op];
        return [method, { ...op, tags: [group.name] }];
      }),
    );
  }
  const tags = (doc.tags as unknown[] | undefined) ?? groups.map(({ name, description }) => ({ name, description }));
  return { ...doc, tags, paths };
}
