/** Where a message in the outbox stands. */
export type OutboxStatus = 'pending' | 'sending' | 'sent' | 'failed';
