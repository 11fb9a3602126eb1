import { z } from 'zod';
import { answerQuote, QUOTE_TOKEN } from '@/db/queries/quote-answers';
import { clientAddress } from '@/lib/api/limit';
import { ANYONE, route } from '@/lib/api/route';
import { countingFailedLinks, throttlePublicRequest } from '@/lib/api/throttle';
import { wakeMailSender } from '@/lib/mail/service';
import { quoteAnswerSchema } from '@/shared/schemas/quote-answer';

// POST /api/q/:token/answer – public (the customer's link): accept with a typed full name, or decline with a reason
export const POST = route(
  { permission: ANYONE, params: z.object({ token: z.string().regex(QUOTE_TOKEN) }), body: quoteAnswerSchema },
  async ({ req, db, params, body }) => {
    await throttlePublicRequest(req, 'quote-page');
    const quote = await countingFailedLinks(req, () => answerQuote(db, params.token, body, clientAddress(req.headers)));
    wakeMailSender();
    // What changed, not the quote again: the page reloads to show it.
    return {
      state: quote.state,
      answeredAt: quote.answeredAt,
      acceptedName: quote.revision.acceptedName,
      declineReason: quote.revision.declineReason,
      paymentClosed: quote.paymentClosed,
    };
  },
);
