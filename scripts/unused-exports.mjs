// Lists exports of src/ files that nothing else in src/ or bench/ imports: dead code, or an
// export kept only so tests can reach inside a module. Part of `npm run lint`.
// Only values count (functions, classes, constants); an export that is deliberately there for
// tests only carries `@testOnly` in its doc comment.
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const walk = (dir) =>
  readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? walk(join(dir, e.name)) : e.name.endsWith('.ts') ? [join(dir, e.name)] : [],
  );
const src = walk(join(root, 'src'));
const users = [...src, ...walk(join(root, 'bench'))];
/** Entry points: what they export is for the outside world. */
const ENTRIES = new Set(['src/cli.ts', 'src/index.ts']);

const exportsOf = new Map(); // file → Map(name → testOnly)
const used = new Set(); // `${file}#${name}`
const resolveSpec = (from, spec) => {
  if (!spec.startsWith('.')) return null;
  return resolve(dirname(from), spec).replace(/\.js$/, '.ts');
};

for (const file of users) {
  const text = readFileSync(file, 'utf8');
  const sf = ts.createSourceFile(file, text, ts.ScriptTarget.ES2022, true);
  const mine = new Map();
  const testOnly = (node) => ts.getJSDocTags(node).some((t) => t.tagName.text === 'testOnly');
  for (const st of sf.statements) {
    const isExported =
      ts.canHaveModifiers(st) && ts.getModifiers(st)?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword);
    // Types vanish at run time and often name a signature's parts; only values are checked.
    const isType = ts.isInterfaceDeclaration(st) || ts.isTypeAliasDeclaration(st);
    if (isExported && !isType) {
      if (ts.isVariableStatement(st))
        for (const d of st.declarationList.declarations) mine.set(d.name.getText(sf), testOnly(st));
      else if (st.name) mine.set(st.name.getText(sf), testOnly(st));
    }
    if ((ts.isImportDeclaration(st) || ts.isExportDeclaration(st)) && st.moduleSpecifier) {
      const target = resolveSpec(file, st.moduleSpecifier.text);
      if (target === null) continue;
      const clause = ts.isImportDeclaration(st) ? st.importClause?.namedBindings : st.exportClause;
      if (!clause) {
        used.add(`${target}#*`); // export * / import * as
        continue;
      }
      if (ts.isNamespaceImport(clause) || ts.isNamespaceExport?.(clause)) {
        used.add(`${target}#*`);
        continue;
      }
      for (const el of clause.elements) used.add(`${target}#${(el.propertyName ?? el.name).getText(sf)}`);
    }
  }
  if (src.includes(file)) exportsOf.set(file, mine);
}

const unused = [];
for (const [file, names] of exportsOf) {
  const rel = relative(root, file);
  if (ENTRIES.has(rel) || used.has(`${file}#*`)) continue;
  for (const [name, testOnly] of names) {
    if (!testOnly && !used.has(`${file}#${name}`)) unused.push(`${rel}: ${name}`);
  }
}
if (unused.length > 0) {
  console.error(`Exports nothing in src/ or bench/ imports (remove them, or mark one that tests need with @testOnly):`);
  for (const u of unused) console.error(`  ${u}`);
  process.exit(1);
}
console.log(`unused exports: none (${exportsOf.size} files)`);
