'use client';

import { usePathname, useRouter, useSearchParams } from 'next/navigation';

/** Filters live in the URL, so a filtered rack can be bookmarked and shared. */
export function StockFilters({ showStatus, materials, locations }: { showStatus: boolean; materials: string[]; locations: string[] }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  function set(key: string, value: string) {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    router.replace(`${pathname}${next.size ? `?${next}` : ''}`);
  }
  return (
    <div className="mb-4 flex flex-wrap items-end gap-3" role="search" aria-label="Filter stock">
      <div className="w-48">
        <label htmlFor="f-material" className="field-label">
          Material
        </label>
        <input
          id="f-material"
          className="field-input"
          list="f-materials"
          defaultValue={params.get('material') ?? ''}
          onChange={(e) => set('material', e.target.value)}
          placeholder="Any"
        />
        <datalist id="f-materials">
          {materials.map((m) => (
            <option key={m} value={m} />
          ))}
        </datalist>
      </div>
      {!showStatus && (
        <div className="w-32">
          <label htmlFor="f-thickness" className="field-label">
            Thickness
          </label>
          <input
            id="f-thickness"
            className="field-input"
            defaultValue={params.get('thickness') ?? ''}
            onChange={(e) => set('thickness', e.target.value)}
            placeholder='3/4", 4/4'
          />
        </div>
      )}
      <div className="w-40">
        <label htmlFor="f-location" className="field-label">
          Location
        </label>
        <input
          id="f-location"
          className="field-input"
          list="f-locations"
          defaultValue={params.get('location') ?? ''}
          onChange={(e) => set('location', e.target.value)}
          placeholder="Any"
        />
        <datalist id="f-locations">
          {locations.map((m) => (
            <option key={m} value={m} />
          ))}
        </datalist>
      </div>
      {showStatus ? (
        <div>
          <label htmlFor="f-status" className="field-label">
            Status
          </label>
          <select id="f-status" className="field-input" value={params.get('status') ?? ''} onChange={(e) => set('status', e.target.value)}>
            <option value="">On the rack</option>
            <option value="available">Available</option>
            <option value="reserved">Reserved</option>
            <option value="used">Used</option>
            <option value="scrapped">Scrapped</option>
          </select>
        </div>
      ) : (
        <div>
          <label htmlFor="f-kind" className="field-label">
            Kind
          </label>
          <select id="f-kind" className="field-input" value={params.get('kind') ?? ''} onChange={(e) => set('kind', e.target.value)}>
            <option value="">Sheets and boards</option>
            <option value="sheet">Sheets</option>
            <option value="board">Boards</option>
          </select>
        </div>
      )}
    </div>
  );
}
