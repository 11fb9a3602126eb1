'use client';

import { useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';
import { CutListTable } from './cut-list-table';
import { UploadPanel } from './upload-panel';
import { useMaterials, useParts } from './use-parts';

/** The job's Cut list section: the editable table, the upload, and the CSV export. */
export function CutListSection({ jobId, units, canWrite }: { jobId: string; units: ShopUnits; canWrite: boolean }) {
  const parts = useParts(jobId);
  const materials = useMaterials();
  const [uploading, setUploading] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);

  return (
    <section aria-labelledby="cut-list" className="mb-8">
      <div className="mb-3 flex flex-wrap items-center gap-2">
        <h2 id="cut-list" className="mr-auto">
          Cut list
        </h2>
        {canWrite && !uploading && (
          <button
            type="button"
            className="btn-quiet"
            onClick={() => {
              setUploading(true);
              setNotice(null);
            }}
          >
            Upload CSV or Excel
          </button>
        )}
        <a className="btn-quiet no-underline" href={`/api/jobs/${jobId}/cut-list/export`} download>
          Export CSV
        </a>
      </div>
      {canWrite && (
        <p className="mb-3 text-sm text-graphite-mute">
          Type in the last row and press Enter to add a part. Arrows, Enter and Tab move between cells; changes save as you leave a cell, Escape
          undoes a cell. Lengths take any form — 19 3/4, 19-3/4″, 1′ 7-3/4″, 502 mm.
        </p>
      )}
      {notice && (
        <p role="status" className="mb-3 rounded-md bg-sage-wash px-3 py-2 text-sm text-sage">
          {notice}
        </p>
      )}
      {uploading && (
        <UploadPanel
          jobId={jobId}
          shopUnit={shopLengthUnit(units)}
          onClose={() => setUploading(false)}
          onImported={(message) => {
            setUploading(false);
            setNotice(message);
          }}
        />
      )}
      {parts.isPending && (
        <p role="status" className="text-sm text-graphite-mute">
          Loading the cut list…
        </p>
      )}
      {parts.isError && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          Could not load the cut list: {parts.error.message}{' '}
          <button className="underline" onClick={() => parts.refetch()}>
            Try again
          </button>
        </p>
      )}
      {materials.isError && (
        <p role="alert" className="mb-2 text-sm text-brick">
          The stock room’s materials could not be loaded: pickers are empty.
        </p>
      )}
      {parts.isSuccess && parts.data.length === 0 && !canWrite && (
        <EmptyState title="No parts yet.">Parts come from typed rows, an uploaded file, or a drawer schedule.</EmptyState>
      )}
      {parts.isSuccess && (parts.data.length > 0 || canWrite) && (
        <CutListTable jobId={jobId} parts={parts.data} offers={materials.data ?? []} units={units} canWrite={canWrite} />
      )}
    </section>
  );
}
