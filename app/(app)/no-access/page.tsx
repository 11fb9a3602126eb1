import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { ROLE_LABELS } from '@/lib/auth/permissions';
import { homeFor } from '@/lib/nav';

export default async function NoAccessPage() {
  const user = await requirePageUser();
  return (
    <div className="max-w-lg">
      <h1 className="mb-2">Not open to your role</h1>
      <p className="mb-4 text-graphite-soft">
        As {ROLE_LABELS[user.role].toLowerCase()} you cannot open that page. If you need it, ask the shop’s owner to change your role.
      </p>
      <Link href={homeFor(user.role)} className="btn-quiet no-underline">
        Back to your start page
      </Link>
    </div>
  );
}
