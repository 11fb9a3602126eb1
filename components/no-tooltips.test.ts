import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, test } from 'vitest';

/** Every .tsx file under a folder. */
function sources(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? sources(p) : e.name.endsWith('.tsx') ? [p] : [];
  });
}

describe('no tooltips', () => {
  // A `title` attribute shows only under a mouse pointer: on a tablet or phone nobody ever sees it, so what it would
  // say is written on the page instead. Our own components may take a `title` prop (a heading); HTML, SVG and Link may not.
  test('no HTML or SVG element, nor a Link, carries a title= attribute', () => {
    const found: string[] = [];
    for (const file of [...sources('app'), ...sources('components')]) {
      const source = fs.readFileSync(file, 'utf8');
      for (const m of source.matchAll(/\stitle=/g)) {
        const before = source.slice(0, m.index);
        const tag = /<([A-Za-z][\w.]*)[^<]*$/.exec(before)?.[1] ?? '';
        if (/^[a-z]/.test(tag) || tag === 'Link') found.push(`${file}:${before.split('\n').length} <${tag} title=…>`);
      }
    }
    expect(found).toEqual([]);
  });
});
