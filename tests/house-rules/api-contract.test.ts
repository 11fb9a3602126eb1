/**
 * The `/api` contract of `shared/wire/api.ts`, on disk: every row names a route file that exists, exports that
 * method through `route()`, and is headed `// METHOD /api/path – purpose` with the row's own path; the screens reach
 * `/api` only through `client/api.ts`'s `call`. The types of each row are held by `api-contract.ts` (tsc).
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { API_ROUTES } from '@/shared/wire/api';

const ROOT = path.resolve(import.meta.dirname, '../..');

/** `'PATCH /api/jobs/:id/parts/:partId'` → `app/api/jobs/[id]/parts/[partId]/route.ts`. */
const fileOf = (key: string) => `app${key.split(' ')[1].replace(/:(\w+)/g, '[$1]')}/route.ts`;

function filesOf(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? filesOf(full) : /\.tsx?$/.test(name) ? [full] : [];
  });
}

describe('the /api contract (shared/wire/api.ts)', () => {
  test('names the routes the screens call, each once', () => {
    expect(API_ROUTES.length).toBeGreaterThan(50);
    expect(new Set(API_ROUTES).size).toBe(API_ROUTES.length);
    for (const key of API_ROUTES) expect(key).toMatch(/^(GET|POST|PUT|PATCH|DELETE) \/api(\/(:?[a-z][\w-]*))+$/i);
  });

  test.each(API_ROUTES.map((key) => [key]))('%s: the route file exports the method, built with route()', (key) => {
    const [method, urlPath] = key.split(' ');
    const file = fileOf(key);
    expect(existsSync(path.join(ROOT, file)), `${file} exists`).toBe(true);
    const text = readFileSync(path.join(ROOT, file), 'utf8');
    expect(text, `${file} exports ${method} = route(…)`).toMatch(new RegExp(`export const ${method} = route\\(`));
    expect(text, `${file} heads ${method} with its path`).toContain(`// ${method} ${urlPath} `);
  });

  test('components reach /api only through call() of client/api.ts', () => {
    const direct = filesOf(path.join(ROOT, 'components')).flatMap((file) => {
      const text = readFileSync(file, 'utf8');
      return /\bfetch\(/.test(text) ? [path.relative(ROOT, file)] : [];
    });
    expect(direct).toEqual([]);
  });
});
