import { describe, expect, test } from 'vitest';
import { InstanceParseError, parseInstanceLine, parseInstances } from './instances';

describe('parsing the standard instance format (name;n;W;H;w,h[,count];…, bench/data/README.md)', () => {
  test('reads the name, class, bin and every item in order', () => {
    const inst = parseInstanceLine('cl07_020_03;3;100;100;70,20;20,70;55,60');
    expect(inst).toEqual({
      name: 'cl07_020_03',
      cls: 7,
      bin: { w: 100, h: 100 },
      items: [
        { w: 70, h: 20 },
        { w: 20, h: 70 },
        { w: 55, h: 60 },
      ],
    });
  });

  test('expands an item count into that many items', () => {
    expect(parseInstanceLine('x;4;10;10;2,3,3;5,5').items).toEqual([
      { w: 2, h: 3 },
      { w: 2, h: 3 },
      { w: 2, h: 3 },
      { w: 5, h: 5 },
    ]);
  });

  test('a name outside the class pattern has no class, and a trailing ";" is allowed', () => {
    expect(parseInstanceLine('kitchen;1;2440;1220;600,400;')).toMatchObject({ cls: null, items: [{ w: 600, h: 400 }] });
  });

  test('skips blank and # comment lines and keeps line numbers in errors', () => {
    const text = '# header\n\ncl01_020_01;1;10;10;3,4\ncl01_020_02;2;10;10;3,4\n';
    expect(() => parseInstances(text)).toThrow('line 4: instance cl01_020_02 declares n = 2 but lists 1 item(s)');
    expect(parseInstances(text.split('\n').slice(0, 3).join('\n'))).toHaveLength(1);
  });

  test.each([
    { label: 'too few fields', line: 'a;1;10', message: /expected "name;n;W;H;w,h;…", got 3 field\(s\)/ },
    { label: 'a zero bin side', line: 'a;1;0;10;1,1', message: /bin width W must be a positive integer, got "0"/ },
    { label: 'a decimal size', line: 'a;1;10;10;1.5,1', message: /item 1 width must be a positive integer, got "1.5"/ },
    { label: 'an item with one number', line: 'a;1;10;10;7', message: /item 1 must be "w,h" or "w,h,count", got "7"/ },
    { label: 'an empty field in the middle', line: 'a;2;10;10;;1,1', message: /item 1 must be "w,h" or "w,h,count", got ""/ },
    { label: 'an empty name', line: ';1;10;10;1,1', message: /instance name is empty/ },
  ])('refuses $label with a specific message', ({ line, message }) => {
    expect(() => parseInstanceLine(line, 7)).toThrow(InstanceParseError);
    expect(() => parseInstanceLine(line, 7)).toThrow(message);
  });

  test('refuses the same instance name twice', () => {
    expect(() => parseInstances('a;1;10;10;1,1\na;1;10;10;1,1')).toThrow('line 2: instance name a appears twice');
  });
});
