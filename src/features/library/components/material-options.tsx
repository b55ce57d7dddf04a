/** How the library's materials are named in every select that picks one. */
export const describeMaterial = {
  particle: (m: { name: string; radiusNm: number }) => `${m.name} (radius ${m.radiusNm} nm)`,
  salt: (m: { name: string; valence: number }) => `${m.name} (valence ${m.valence})`,
  plain: (m: { name: string }) => m.name,
};

/** The <option>s of a select over library materials, valued by id. */
export function MaterialOptions<T extends { id: number; name: string }>({ items, describe = describeMaterial.plain }: { items: readonly T[]; describe?: (m: T) => string }) {
  return (
    <>
      {items.map((m) => (
        <option key={m.id} value={m.id}>
          {describe(m)}
        </option>
      ))}
    </>
  );
}
