'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { StatusBadge } from '@/components/ui/status-badge';
import { ROLE_LABELS, ROLES, type Role } from '@/lib/auth/permissions';
import { ApiError, call } from '@/client/api';
import type { ApiBody } from '@/shared/wire/api';

export function TeamManager({ selfId }: { selfId: string }) {
  const queryClient = useQueryClient();
  const team = useQuery({ queryKey: ['team'], queryFn: () => call('GET /api/team') });
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [rowError, setRowError] = useState<string | null>(null);

  const add = useMutation({
    mutationFn: (body: ApiBody<'POST /api/team'>) => call('POST /api/team', { body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['team'] }),
    onError: (e) => setFields(e instanceof ApiError ? e.fields : {}),
  });
  const [withPassword, setWithPassword] = useState(false);
  const resend = useMutation({
    mutationFn: (id: string) => call('POST /api/team/:id/invite', { params: { id } }),
    onSuccess: (m) => {
      setRowError(null);
      setNotice(`A new invite is on its way to ${m.email}; the earlier link no longer works.`);
    },
    onError: (e) => setRowError(e.message),
  });
  const [notice, setNotice] = useState<string | null>(null);
  const change = useMutation({
    mutationFn: ({ id, ...body }: { id: string; role?: Role; active?: boolean }) => call('PATCH /api/team/:id', { params: { id }, body }),
    onSuccess: () => {
      setRowError(null);
      queryClient.invalidateQueries({ queryKey: ['team'] });
    },
    onError: (e) => setRowError(e.message),
  });

  function onAdd(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formEl = event.currentTarget;
    const form = new FormData(formEl);
    const text = (name: string) => String(form.get(name) ?? '');
    setFields({});
    add.mutate(
      // The select offers only the roles; the server checks the value all the same.
      { name: text('name'), email: text('email'), role: text('role') as Role, ...(withPassword ? { password: text('password') } : {}) },
      { onSuccess: () => formEl.reset() },
    );
  }

  return (
    <div className="grid grid-cols-1 gap-8 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <div>
        {team.isPending && (
          <p role="status" className="text-sm text-graphite-mute">
            Loading the team…
          </p>
        )}
        {team.isError && (
          <p role="alert" className="text-sm text-brick">
            Could not load the team: {team.error.message}
          </p>
        )}
        {rowError && (
          <p role="alert" className="mb-3 rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
            {rowError}
          </p>
        )}
        {notice && !rowError && (
          <p role="status" className="mb-3 rounded-md bg-sage-wash px-3 py-2 text-sm text-sage">
            {notice}
          </p>
        )}
        {team.isSuccess && (
          <div className="card overflow-x-auto">
            <table className="data-table" aria-label="Team">
              <thead>
                <tr>
                  <th>Name</th>
                  <th>E-mail</th>
                  <th>Role</th>
                  <th>Status</th>
                  <th />
                </tr>
              </thead>
              <tbody>
                {team.data.map((m) => (
                  <tr key={m.id} className={m.active ? '' : 'text-graphite-mute'}>
                    <td className="font-medium">
                      {m.name}
                      {m.id === selfId && <span className="ml-1 text-xs text-graphite-mute">(you)</span>}
                    </td>
                    <td>{m.email}</td>
                    <td>
                      <select
                        aria-label={`Role of ${m.name}`}
                        className="field-input min-w-[7.5rem] py-1"
                        value={m.role}
                        disabled={change.isPending}
                        onChange={(e) => change.mutate({ id: m.id, role: e.target.value as Role })}
                      >
                        {ROLES.map((r) => (
                          <option key={r} value={r}>
                            {ROLE_LABELS[r]}
                          </option>
                        ))}
                      </select>
                    </td>
                    <td>
                      {!m.active ? (
                        <StatusBadge tone="neutral">Deactivated</StatusBadge>
                      ) : m.invited ? (
                        <>
                          <StatusBadge tone="warn">Invited</StatusBadge>
                          <button
                            type="button"
                            className="mt-1 block whitespace-nowrap text-xs text-graphite-soft underline hover:text-graphite"
                            disabled={resend.isPending}
                            onClick={() => resend.mutate(m.id)}
                            aria-label={`Resend the invite to ${m.name}`}
                          >
                            Resend invite
                          </button>
                        </>
                      ) : (
                        <StatusBadge tone="good">Active</StatusBadge>
                      )}
                    </td>
                    <td className="text-right">
                      <button
                        type="button"
                        className={m.active ? 'btn-danger py-1' : 'btn-quiet py-1'}
                        disabled={change.isPending}
                        onClick={() => change.mutate({ id: m.id, active: !m.active })}
                      >
                        {m.active ? 'Deactivate' : 'Reactivate'}
                      </button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </div>
      <form onSubmit={onAdd} className="card flex flex-col gap-3 p-5" aria-label="Add a person">
        <h2>Add a person</h2>
        <p className="text-sm text-graphite-mute">They get an e-mail with a link to choose their own password. The link works once, for 7 days.</p>
        {(['name', 'email'] as const).map((f) => (
          <div key={f}>
            <label htmlFor={`member-${f}`} className="field-label">
              {{ name: 'Name', email: 'E-mail' }[f]}
            </label>
            <input id={`member-${f}`} name={f} type={f === 'email' ? 'email' : 'text'} className="field-input" autoComplete="off" />
            {fields[f] && <p className="field-error">{fields[f][0]}</p>}
          </div>
        ))}
        <div>
          <label htmlFor="member-role" className="field-label">
            Role
          </label>
          <select id="member-role" name="role" className="field-input" defaultValue="cutter">
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        </div>
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1" checked={withPassword} onChange={(e) => setWithPassword(e.target.checked)} />
          <span>Set a first password myself instead (hand it over in person; no invite is sent)</span>
        </label>
        {withPassword && (
          <div>
            <label htmlFor="member-password" className="field-label">
              First password
            </label>
            <input id="member-password" name="password" type="password" className="field-input" autoComplete="new-password" />
            {fields.password && <p className="field-error">{fields.password[0]}</p>}
          </div>
        )}
        {add.isError && !Object.keys(fields).length && <p className="field-error">{add.error.message}</p>}
        {add.isSuccess && (
          <p role="status" className="text-sm text-sage">
            {add.data.invited ? `Invited ${add.data.name}: the e-mail is on its way to ${add.data.email}.` : `Added ${add.data.name}.`}
          </p>
        )}
        <button type="submit" className="btn-accent" disabled={add.isPending}>
          {add.isPending ? 'Adding…' : withPassword ? 'Add to team' : 'Send invite'}
        </button>
      </form>
    </div>
  );
}
