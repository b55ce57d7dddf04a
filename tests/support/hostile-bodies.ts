import { seededRandom } from '../../shared/seeded-random';

export interface HostileBody {
  kind: string;
  contentType: string;
  payload: string | Buffer;
}

const INJECTIONS = [
  "' OR '1'='1",
  "1; DROP TABLE users; --",
  "\\'; SELECT SLEEP(5); --",
  '<script>alert(document.cookie)</script>',
  '"><img src=x onerror=alert(1)>',
  '{{7*7}}',
  '${process.exit()}',
  '../../../../etc/passwd',
  '\u0000\u0001\u0002',
  '=cmd|" /C calc"!A0',
  '%00%27',
];

/**
 * A seeded stream of malformed request bodies: wrong types, truncated JSON, deep nesting,
 * huge numbers, megabyte strings, wrong content types, injection and script payloads.
 * The same seed gives the same bodies, so a failure can be replayed.
 */
export function hostileBodies(seed: number, count: number): HostileBody[] {
  const random = seededRandom(seed);
  const pick = <T>(items: readonly T[]) => items[Math.floor(random() * items.length)];
  const keys = ['email', 'name', 'role', 'password', 'token', 'programmeId', 'recipeId', 'title', 'items', 'fraction', 'attraction', 'phi', 'status', 'approvedBy', 'createdBy', 'derived', 'comment', 'goalState', 'radiusNm', 'observedState', 'mixedAt', 'ageDays', 'active', '__proto__', 'constructor'];
  const scalar = (): unknown =>
    pick([
      () => pick(INJECTIONS),
      () => Math.floor(random() * 1e6) - 5e5,
      () => pick([1e308, -1e308, 1e400, Number.MAX_SAFE_INTEGER * 4, -0, 0.1 + 0.2]),
      () => pick([true, false, null]),
      () => 'x'.repeat(Math.floor(random() * 300)),
      () => [],
      () => ({}),
      () => pick(['NaN', 'Infinity', '-1', '1e999', '0x1F', '  ', '', '2026-02-30', 'gel', 'admin']),
    ])();
  const object = (depth: number): Record<string, unknown> => {
    const out: Record<string, unknown> = {};
    const n = 1 + Math.floor(random() * 5);
    for (let i = 0; i < n; i++) out[pick(keys)] = depth > 0 && random() < 0.3 ? object(depth - 1) : random() < 0.2 ? [scalar(), scalar()] : scalar();
    return out;
  };
  const generators: (() => HostileBody)[] = [
    () => ({ kind: 'wrong types', contentType: 'application/json', payload: JSON.stringify(object(2)) }),
    () => {
      const text = JSON.stringify(object(2));
      return { kind: 'truncated JSON', contentType: 'application/json', payload: text.slice(0, Math.max(1, Math.floor(text.length * random()))) };
    },
    () => {
      const depth = 2000 + Math.floor(random() * 20_000);
      return { kind: 'deep nesting', contentType: 'application/json', payload: '['.repeat(depth) + ']'.repeat(depth) };
    },
    () => ({ kind: 'deep object nesting', contentType: 'application/json', payload: '{"a":'.repeat(3000) + '1' + '}'.repeat(3000) }),
    () => ({ kind: 'huge numbers', contentType: 'application/json', payload: `{"phi": 1e999, "programmeId": 123456789012345678901234567890, "ageDays": -1e308, "valence": 9.999e307}` }),
    () => ({ kind: '1 MB string', contentType: 'application/json', payload: JSON.stringify({ name: 'x'.repeat(1024 * 1024), email: 'a@b.c' }) }),
    () => ({ kind: 'wrong content type', contentType: pick(['text/plain', 'application/x-www-form-urlencoded', 'application/xml', 'text/html', 'multipart/form-data; boundary=zzz']), payload: pick(['email=a@b.c&role=admin', '<x>1</x>', JSON.stringify(object(1)), '--zzz\r\nContent-Disposition: form-data; name="a"\r\n\r\n1\r\n--zzz--']) }),
    () => ({ kind: 'injection strings', contentType: 'application/json', payload: JSON.stringify(Object.fromEntries(keys.slice(0, 12).map((k) => [k, pick(INJECTIONS)]))) }),
    () => ({ kind: 'not an object', contentType: 'application/json', payload: pick(['null', '42', '"text"', '[1,2,3]', 'true', '[]']) }),
    () => ({ kind: 'invalid UTF-8', contentType: 'application/json', payload: Buffer.from([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xff, 0xfe, 0xc3, 0x28, 0x22, 0x7d]) }),
    () => ({ kind: 'prototype pollution', contentType: 'application/json', payload: '{"__proto__": {"role": "admin", "isAdmin": true}, "constructor": {"prototype": {"active": true}}}' }),
  ];
  return Array.from({ length: count }, () => pick(generators)());
}
