'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { partsKey, useMaterials } from '@/components/cut-list/use-parts';
import { call } from '@/client/api';
import { JOINT_NAMES } from '@/lib/joinery';
import { formatLength } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';
import { ScheduleForm } from './schedule-form';
import type { SavedDrawerSchedule } from '@/shared/wire/jobs';

/** The job's Drawer schedules section: saved schedules, and the form that adds or changes one. */
export function DrawerSchedulesSection({ jobId, units, canWrite }: { jobId: string; units: ShopUnits; canWrite: boolean }) {
  const qc = useQueryClient();
  const schedules = useQuery({
    queryKey: ['drawer-schedules', jobId],
    queryFn: () => call('GET /api/jobs/:id/drawer-schedules', { params: { id: jobId } }),
  });
  const cards = useQuery({ queryKey: ['setup-cards'], queryFn: () => call('GET /api/setup-cards') });
  const materials = useMaterials();
  const slideModels = useQuery({ queryKey: ['slide-models'], queryFn: () => call('GET /api/slide-models') });
  const [editing, setEditing] = useState<SavedDrawerSchedule | 'new' | null>(null);
  const remove = useMutation({
    mutationFn: (id: string) => call('DELETE /api/jobs/:id/drawer-schedules/:scheduleId', { params: { id: jobId, scheduleId: id } }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: ['drawer-schedules', jobId] });
      qc.invalidateQueries({ queryKey: partsKey(jobId) });
    },
  });
  const len = (mm: number) => formatLength(mm, units);

  return (
    <section aria-labelledby="drawer-schedules">
      <div className="mb-3 flex items-center">
        <h2 id="drawer-schedules" className="mr-auto">
          Drawer schedules
        </h2>
        {canWrite && editing === null && (
          <button type="button" className="btn-accent" onClick={() => setEditing('new')}>
            New drawer schedule
          </button>
        )}
      </div>
      <p className="mb-4 max-w-3xl text-sm text-graphite-mute">
        A schedule is a set of identical drawer boxes. Kerfwise sizes every part from the opening, slides, joint and stock, and keeps its rows in the
        cut list in step when the schedule changes.
      </p>
      {editing !== null && (materials.isPending || slideModels.isPending) && (
        <p role="status" className="text-sm text-graphite-mute">
          Reading the stock room and slide models…
        </p>
      )}
      {editing !== null && !materials.isPending && !slideModels.isPending && (
        <ScheduleForm
          key={editing === 'new' ? 'new' : editing.id}
          jobId={jobId}
          units={units}
          cards={cards.data ?? []}
          offers={materials.data ?? []}
          slideModels={slideModels.data ?? []}
          editing={editing === 'new' ? null : { id: editing.id, input: editing.input }}
          onDone={() => setEditing(null)}
        />
      )}
      {schedules.isPending && (
        <p role="status" className="text-sm text-graphite-mute">
          Loading drawer schedules…
        </p>
      )}
      {schedules.isError && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          Could not load drawer schedules: {schedules.error.message}
        </p>
      )}
      {remove.isError && (
        <p role="alert" className="field-error">
          {remove.error.message}
        </p>
      )}
      {schedules.isSuccess && schedules.data.length === 0 && editing === null && (
        <EmptyState title="No drawer schedules yet.">
          {canWrite ? 'Add one to size a set of drawer boxes and put their parts in the cut list.' : 'An estimator adds them.'}
        </EmptyState>
      )}
      <ul className="grid gap-3 md:grid-cols-2">
        {schedules.data?.map((s) => (
          <li key={s.id} id={`schedule-${s.id}`} className="card p-4">
            <div className="flex items-start gap-2">
              <div className="mr-auto">
                <p className="font-semibold">{s.label}</p>
                <p className="text-sm text-graphite-mute">
                  {s.input.quantity} × {s.input.size.from === 'opening' ? 'opening' : 'box'} {len(s.input.size.width)} × {len(s.input.size.height)} ×{' '}
                  {len(s.input.size.depth)} · {JOINT_NAMES[s.input.joint.method]} · {s.partRows} rows in the cut list
                </p>
              </div>
              {canWrite && (
                <>
                  <button type="button" className="btn-quiet" onClick={() => setEditing(s)} aria-label={`Edit ${s.label}`}>
                    Edit
                  </button>
                  <button
                    type="button"
                    className="btn-danger"
                    disabled={remove.isPending}
                    onClick={() => {
                      if (window.confirm(`Delete “${s.label}” and its ${s.partRows} cut-list rows?`)) remove.mutate(s.id);
                    }}
                    aria-label={`Delete ${s.label}`}
                  >
                    Delete
                  </button>
                </>
              )}
            </div>
          </li>
        ))}
      </ul>
    </section>
  );
}
