import { NotFoundMessage } from '@/components/ui/not-found-message';

/** A page of the signed-in app that is missing (or another shop's, or a draft this person may not see): the shell stays. */
export default function AppNotFound() {
  return <NotFoundMessage home="/" />;
}
