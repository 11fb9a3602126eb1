import { sendRevision } from '@/db/queries/quotes';
import { idParams, route } from '@/server/api/route';
import { wakeMailSender } from '@/server/mail/service';

// POST /api/quotes/:id/send – e-mail the latest revision to the job's customer (PDF and link to their page), replacing
// an earlier sent one; the job becomes quoted
export const POST = route({ permission: 'quotes:write', params: idParams }, async ({ scope, params }) => {
  const sent = await sendRevision(scope, params.id);
  wakeMailSender();
  return sent;
});
