// A lint rule: no import loop between the API's top-level folders (apps/api/src/<folder>/).
// import-x/no-cycle sees loops between files; this one sees them between folders, so that a feature
// depends on another in one direction only even when no single chain of files closes a loop.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

const SRC = path.resolve(import.meta.dirname, '../apps/api/src');

/**
 * database/ holds the entities (the persistence model every feature reads; TypeORM relations point
 * both ways by nature, so they live together) and the wiring that lists them with the migrations and
 * drives the features to seed, like app.module.ts. A feature may import it; its own imports do not count.
 */
const WIRING = new Set(['database']);

const folderOf = (file) => {
  const relative = path.relative(SRC, file);
  if (relative.startsWith('..') || !relative.includes(path.sep)) return null;
  return relative.split(path.sep)[0];
};

/** The folder a relative import reaches, or null when it stays in its folder or is not a folder edge. */
function importedFolder(file, specifier) {
  if (!specifier.startsWith('.')) return null;
  const target = path.resolve(path.dirname(file), specifier);
  const from = folderOf(file);
  const to = folderOf(target);
  if (from === null || to === null || from === to || WIRING.has(from)) return null;
  return to;
}

function sourceFiles(directory) {
  return readdirSync(directory, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(directory, entry.name);
    if (entry.isDirectory()) return sourceFiles(full);
    return entry.name.endsWith('.ts') ? [full] : [];
  });
}

/** folder -> folder it imports -> one file that does, read once per lint run. */
let graph = null;
function folderGraph() {
  if (graph) return graph;
  graph = new Map();
  for (const file of sourceFiles(SRC)) {
    const { importedFiles } = ts.preProcessFile(readFileSync(file, 'utf8'), true, true);
    for (const { fileName } of importedFiles) {
      const to = importedFolder(file, fileName);
      if (to === null) continue;
      const from = folderOf(file);
      if (!graph.has(from)) graph.set(from, new Map());
      if (!graph.get(from).has(to)) graph.get(from).set(to, path.relative(SRC, file));
    }
  }
  return graph;
}

/** The folders from `start` to `goal` along imports, each with the file that imports the next; null if none. */
function pathBetween(start, goal) {
  const edges = folderGraph();
  const cameFrom = new Map([[start, null]]);
  const queue = [start];
  while (queue.length > 0) {
    const folder = queue.shift();
    if (folder === goal) {
      const steps = [];
      for (let at = goal; cameFrom.get(at) !== null; at = cameFrom.get(at))
        steps.unshift(`${cameFrom.get(at)} -> ${at} (${edges.get(cameFrom.get(at)).get(at)})`);
      return steps;
    }
    for (const next of edges.get(folder)?.keys() ?? []) {
      if (!cameFrom.has(next)) {
        cameFrom.set(next, folder);
        queue.push(next);
      }
    }
  }
  return null;
}

export const apiFolderLoops = {
  meta: {
    type: 'problem',
    docs: { description: 'Forbid import loops between the top-level folders of apps/api/src' },
    schema: [],
  },
  create(context) {
    const file = context.filename;
    const check = (node) => {
      const specifier = node.source?.value;
      if (typeof specifier !== 'string') return;
      const to = importedFolder(file, specifier);
      if (to === null) return;
      const from = folderOf(file);
      const back = pathBetween(to, from);
      if (back) {
        context.report({
          node: node.source,
          message: `${from}/ imports ${to}/, which already depends on ${from}/: ${back.join(', ')}. A folder depends on another in one direction only; move what both need where both can import it.`,
        });
      }
    };
    return {
      ImportDeclaration: check,
      ExportNamedDeclaration: check,
      ExportAllDeclaration: check,
      ImportExpression: check,
    };
  },
};
