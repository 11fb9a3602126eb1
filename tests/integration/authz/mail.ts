import { mailOutbox, userTokens, users } from '@/db/schema';
import { hashToken, NO_PASSWORD_YET } from '@/db/queries/user-links';
import { nextNumber, uniqueEmail } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

/** A token of the links' shape, distinct per call and without randomness. */
const fixtureToken = () => `kw${String(nextNumber()).padStart(41, '0')}`;

const person = async ({ db, mine }: AuthzFixtures, invited: boolean) => {
  const [u] = await db
    .insert(users)
    .values({
      shopId: mine.id,
      name: 'Linked person',
      email: uniqueEmail('linked'),
      role: 'cutter',
      passwordHash: invited ? NO_PASSWORD_YET : '$2b$04$notarealhashbutshapedlikeoneXXXXXXXXXXXXXXXXXXXXXXXXX',
    })
    .returning();
  return u;
};

const linkFor = (purpose: 'invite' | 'password-reset') => async (fx: AuthzFixtures) => {
  const u = await person(fx, purpose === 'invite');
  const token = fixtureToken();
  await fx.db
    .insert(userTokens)
    .values({ shopId: u.shopId, userId: u.id, purpose, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + 3600_000) });
  return { token };
};

const invitedPerson = async (fx: AuthzFixtures) => ({ id: (await person(fx, true)).id });

const failedMail = async ({ db, mine }: AuthzFixtures) => {
  const [m] = await db
    .insert(mailOutbox)
    .values({
      shopId: mine.id,
      kind: 'invite',
      toAddress: 'nobody@example.com',
      subject: 'Refused',
      textBody: 'x',
      messageId: `<authz-${nextNumber()}@example.com>`,
      status: 'failed',
      lastError: '550 No such mailbox',
    })
    .returning();
  return { id: m.id };
};

const everyone = (status: number) => ({ anonymous: status, owner: status, estimator: status, cutter: status, other: status });

export const rows: AuthzRow[] = [
  // Public: the people these serve cannot sign in yet. The link itself is the credential.
  { route: '/api/invites/[token]', method: 'POST', target: linkFor('invite'), body: { password: 'long-enough-password' }, expect: everyone(200) },
  {
    route: '/api/password-resets/[token]',
    method: 'POST',
    target: linkFor('password-reset'),
    body: { password: 'long-enough-password' },
    expect: everyone(200),
  },
  { route: '/api/password-resets', method: 'POST', body: { email: 'EMAIL' }, expect: everyone(202) },
  {
    route: '/api/team/[id]/invite',
    method: 'POST',
    target: invitedPerson,
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 404 },
  },
  {
    route: '/api/outbox/[id]/retry',
    method: 'POST',
    target: failedMail,
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 404 },
  },
];
