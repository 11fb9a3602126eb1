import Link from 'next/link';
import { getDb } from '@/db/client';
import { LINK_REFUSALS, lookUpLink, type LinkPurpose } from '@/db/queries/user-links';
import { SetPasswordForm } from '@/components/auth/set-password-form';

/** The page a single-use link opens: the form to choose a password, or why the link no longer works. */
export async function LinkPage({ purpose, token }: { purpose: LinkPurpose; token: string }) {
  const state = await lookUpLink(await getDb(), purpose, token);
  const invite = purpose === 'invite';
  if (!state.ok) {
    return (
      <div className="card p-6 shadow-sm">
        <h1 className="mb-2 text-xl">{invite ? 'This invite cannot be used' : 'This reset link cannot be used'}</h1>
        <p role="alert" className="mb-5 text-sm text-graphite-soft">
          {LINK_REFUSALS[state.reason]}
        </p>
        <div className="flex flex-wrap gap-3 text-sm">
          <Link href="/sign-in" className="btn-quiet">
            Sign in
          </Link>
          <Link href="/forgot-password" className="btn-quiet">
            Get a new link
          </Link>
        </div>
      </div>
    );
  }
  return (
    <div className="card p-6 shadow-sm">
      <h1 className="mb-1 text-xl">{invite ? `Welcome to ${state.shopName}` : 'Choose a new password'}</h1>
      <p className="mb-5 text-sm text-graphite-mute">
        {invite ? `${state.name}, choose the password you will sign in with as ` : 'For '}
        <span className="break-all font-medium text-graphite">{state.email}</span>.
      </p>
      <SetPasswordForm link={{ purpose, token }} email={state.email} submitLabel={invite ? 'Set password and sign in' : 'Save and sign in'} />
    </div>
  );
}
