/**
 * The layers of docs/ARCHITECTURE.md, checked on every file: who may import whom. Written as a table in the manner of
 * the authorization matrix — a row per layer with what it must never reach — so a new folder or package gets a row,
 * not a new test. Imports are read with TypeScript's own pre-processor (every `import`, `export … from`, `import()`
 * and `require`), type-only imports included: a component that names a query's row type is tied to the query.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { describe, expect, test } from 'vitest';

const ROOT = path.resolve(import.meta.dirname, '../..');
const LAYERS = ['app', 'bench', 'client', 'components', 'db', 'lib', 'seeds', 'server', 'shared', 'tests', 'workers', 'scripts'] as const;
type Layer = (typeof LAYERS)[number];

/** Packages that tie code to a server, a database, a browser or React: none of them belongs in the pure layers. */
const FRAMEWORK = [
  'next',
  'next-auth',
  'react',
  'react-dom',
  'server-only',
  'react-konva',
  'konva',
  'zustand',
  '@tanstack/react-query',
  '@tanstack/react-table',
  'react-hook-form',
  'recharts',
];
const INFRASTRUCTURE = [
  'pg',
  '@electric-sql/pglite',
  'drizzle-orm',
  'nodemailer',
  'smtp-server',
  'stripe',
  'pino',
  'pino-pretty',
  'rate-limiter-flexible',
  'bcryptjs',
];

interface Rule {
  layer: Layer;
  /** Which files of the layer the row is about. */
  files: 'code' | 'all';
  refusedLayers: Layer[];
  refusedPackages: string[];
  why: string;
}

const RULES: Rule[] = [
  {
    layer: 'lib',
    files: 'code',
    refusedLayers: ['app', 'bench', 'client', 'components', 'db', 'seeds', 'server', 'tests', 'workers', 'scripts'],
    refusedPackages: [...FRAMEWORK, ...INFRASTRUCTURE],
    why: 'lib/ is the pure core: data in, data out, tested without a server, a database or a browser',
  },
  {
    layer: 'lib',
    files: 'all',
    refusedLayers: ['app', 'client', 'components', 'db', 'server', 'workers'],
    refusedPackages: [...FRAMEWORK, ...INFRASTRUCTURE],
    why: "lib/'s tests test the core alone (they may read the benchmark's published instances and reference packer)",
  },
  {
    layer: 'shared',
    files: 'all',
    refusedLayers: ['app', 'bench', 'client', 'components', 'db', 'seeds', 'server', 'tests', 'workers', 'scripts'],
    refusedPackages: [...FRAMEWORK, ...INFRASTRUCTURE],
    why: 'shared/ holds the zod schemas the server, the browser and the workers all load',
  },
  {
    layer: 'components',
    files: 'all',
    refusedLayers: ['db', 'server', 'seeds', 'bench', 'scripts'],
    refusedPackages: INFRASTRUCTURE,
    why: 'components take data from their page or from /api through client/, never from the database code',
  },
  {
    layer: 'client',
    files: 'all',
    refusedLayers: ['app', 'db', 'server', 'seeds', 'bench', 'scripts'],
    refusedPackages: INFRASTRUCTURE,
    why: 'client/ runs in the browser',
  },
  {
    layer: 'workers',
    files: 'all',
    refusedLayers: ['app', 'components', 'db', 'server', 'seeds', 'bench', 'scripts'],
    refusedPackages: [...FRAMEWORK, ...INFRASTRUCTURE],
    why: 'a Web Worker is a thin entry point over lib/',
  },
  {
    layer: 'db',
    files: 'code',
    refusedLayers: ['app', 'client', 'components', 'workers', 'bench', 'tests'],
    refusedPackages: ['next', 'next-auth', 'react', 'react-dom', 'react-konva', 'konva', 'zustand'],
    why: 'the database code reads and writes rows; HTTP and screens are above it (it speaks lib/errors.ts, not HTTP statuses)',
  },
  {
    layer: 'app',
    files: 'code',
    refusedLayers: ['bench', 'seeds', 'scripts', 'tests'],
    refusedPackages: ['drizzle-orm', '@electric-sql/pglite', 'pg', 'postgres'],
    why: 'pages and route handlers read and write through db/queries (and server/), never with SQL of their own',
  },
  {
    layer: 'server',
    files: 'code',
    refusedLayers: ['app', 'client', 'components', 'workers', 'bench', 'tests'],
    refusedPackages: ['react-konva', 'konva', 'zustand', '@tanstack/react-query'],
    why: 'server/ is the glue between Next.js and the database code, not a screen',
  },
];

/** Modules that db/ may not import even inside server/ — HTTP lives above the database code. */
const REFUSED_MODULES: { layer: Layer; module: string; why: string }[] = [
  { layer: 'db', module: 'server/api', why: 'queries throw lib/errors.ts refusals; server/api/errors.ts maps them to HTTP' },
  { layer: 'app', module: 'db/schema', why: 'a page or a route asks db/queries for what it needs; the tables are the queries’ business' },
];

function filesOf(dir: string): string[] {
  const out: string[] = [];
  const walk = (d: string) => {
    for (const name of readdirSync(d)) {
      if (name === 'node_modules' || name.startsWith('.')) continue;
      const full = path.join(d, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (/\.(ts|tsx|mts)$/.test(name) && !name.endsWith('.d.ts')) out.push(full);
    }
  };
  walk(dir);
  return out;
}

const isTest = (file: string) => /\.(test|spec)\.tsx?$/.test(file) || /(^|\/)test-[\w-]+\.ts$/.test(file) || file.includes('/test-support');

interface Import {
  from: string;
  /** The project file's folder at the top (`lib`, `db` …), or null for a package. */
  layer: Layer | null;
  /** The project path without extension (`server/api/errors`), or the package's name. */
  target: string;
}

function importsOf(file: string): Import[] {
  const text = readFileSync(file, 'utf8');
  const { importedFiles } = ts.preProcessFile(text, true, true);
  return importedFiles.map(({ fileName: spec }) => {
    let projectPath: string | null = null;
    if (spec.startsWith('@/')) projectPath = spec.slice(2);
    else if (spec.startsWith('.')) projectPath = path.relative(ROOT, path.resolve(path.dirname(file), spec));
    if (projectPath !== null) {
      const top = projectPath.split('/')[0] as Layer;
      return { from: path.relative(ROOT, file), layer: (LAYERS as readonly string[]).includes(top) ? top : null, target: projectPath };
    }
    const parts = spec.replace(/^node:/, 'node:').split('/');
    const pkg = spec.startsWith('@') ? parts.slice(0, 2).join('/') : parts[0];
    return { from: path.relative(ROOT, file), layer: null, target: pkg };
  });
}

const layerFiles = new Map<Layer, string[]>(LAYERS.map((l) => [l, filesOf(path.join(ROOT, l))]));

describe('import boundaries (docs/ARCHITECTURE.md)', () => {
  test.each(RULES.map((r) => [`${r.layer} (${r.files === 'code' ? 'code' : 'code and tests'})`, r] as const))('%s', (_name, rule) => {
    const files = (layerFiles.get(rule.layer) ?? []).filter((f) => rule.files === 'all' || !isTest(f));
    expect(files.length, `${rule.layer}/ has files to check`).toBeGreaterThan(0);
    const broken = files.flatMap((f) =>
      importsOf(f)
        .filter((i) => (i.layer ? rule.refusedLayers.includes(i.layer) : rule.refusedPackages.includes(i.target)))
        .map((i) => `${i.from} imports ${i.target}`),
    );
    expect(broken, rule.why).toEqual([]);
  });

  test.each(REFUSED_MODULES.map((r) => [`${r.layer} never imports ${r.module}`, r] as const))('%s', (_name, rule) => {
    const broken = (layerFiles.get(rule.layer) ?? []).flatMap((f) =>
      importsOf(f)
        .filter((i) => i.target === rule.module || i.target.startsWith(`${rule.module}/`))
        .map((i) => `${i.from} imports ${i.target}`),
    );
    expect(broken, rule.why).toEqual([]);
  });

  test('shared/ reaches into lib/ only for vocabulary: units, dates and tables of constants, never the engine or a renderer', () => {
    // The lib modules the schemas load, followed through their own imports: all of them go to the browser and the workers.
    const reached = new Set<string>();
    const queue = (layerFiles.get('shared') ?? [])
      .flatMap((f) => importsOf(f))
      .filter((i) => i.layer === 'lib')
      .map((i) => i.target);
    while (queue.length) {
      const target = queue.pop()!;
      if (reached.has(target)) continue;
      reached.add(target);
      const file = ['.ts', '.tsx', '/index.ts'].map((ext) => path.join(ROOT, target + ext)).find((f) => statSafe(f));
      expect(file, `${target} exists`).toBeDefined();
      for (const i of importsOf(file!)) {
        if (i.layer === 'lib') queue.push(i.target);
        else if (!i.layer) expect(['zod'], `${target} (reached from shared/) imports the package ${i.target}`).toContain(i.target);
      }
    }
    const outside = [...reached].filter((t) => !VOCABULARY.some((v) => t === v || t.startsWith(`${v}/`)));
    expect(outside, 'lib modules shared/ reaches beyond the vocabulary').toEqual([]);
  });
});

describe('files named by address', () => {
  test('every `new URL(…, import.meta.url)` (worker entry points, data files) names a file that exists', () => {
    const named = LAYERS.flatMap((layer) =>
      (layerFiles.get(layer) ?? []).flatMap((file) =>
        [...readFileSync(file, 'utf8').matchAll(/new URL\(\s*'(\.{1,2}\/[^']+)',\s*import\.meta\.url\s*\)/g)].map((m) => ({ file, target: m[1] })),
      ),
    );
    expect(named.length, 'the worker handles name their entry points this way').toBeGreaterThan(2);
    const missing = named
      .filter(({ file, target }) => !statSafe(path.resolve(path.dirname(file), target)))
      .map(({ file, target }) => `${path.relative(ROOT, file)} → ${target}`);
    expect(missing).toEqual([]);
  });
});

/** What the schemas may use from lib/: the units and their parsing, the shop's clock, and constant tables. */
const VOCABULARY = [
  'lib/units',
  'lib/dates',
  'lib/auth/permissions',
  'lib/cut-list/limits',
  'lib/joinery/defaults',
  'lib/lumber/species',
  'lib/costing/quote-totals',
  'lib/costing/money',
  'lib/buying/digest',
  'lib/stock/low-stock',
];

function statSafe(file: string): boolean {
  try {
    return statSync(file).isFile();
  } catch {
    return false;
  }
}
