import { redirect } from 'next/navigation';
import { requirePageUser } from '@/server/auth/session';
import { homeFor } from '@/lib/nav';

export default async function Home() {
  const user = await requirePageUser();
  redirect(homeFor(user.role));
}
