import type { QuoteTotals } from '@/lib/costing/quote-totals';
import type { QuoteDiscount, QuoteLine, QuoteRevisionStatus } from '@/shared/schemas/quote';

/** One revision of a quote with its lines and totals: the estimator's view (cost, margin, hours). */
export interface QuoteRevisionView {
  id: string;
  quoteId: string;
  jobId: string;
  /** Q-0007 rev B */
  title: string;
  number: string;
  revision: string;
  status: QuoteRevisionStatus;
  latest: boolean;
  planId: string | null;
  currency: string;
  lines: QuoteLine[];
  markupMaterialPercent: number;
  markupHardwarePercent: number;
  discount: QuoteDiscount;
  taxPercent: number;
  depositPercent: number;
  validityDays: number;
  terms: string;
  sentAt: string | null;
  /** The last day the quote holds (the sending day in the shop's zone + validity), once sent. */
  validUntil: string | null;
  createdAt: string;
  /** The revision's state as its row was read (so an edit can be refused if it changed meanwhile). */
  updatedAt: string;
  /** The customer's answer on their page: when, and the name typed to accept or the reason given to decline. */
  answeredAt: string | null;
  acceptedName: string | null;
  declineReason: string | null;
  /** When the deposit was paid (null while unpaid, or refunded). */
  depositPaidAt: string | null;
  totals: QuoteTotals;
}

/** Where a customer's quote stands after they answered it on their page. */
export interface QuoteAnswered {
  answeredAt: string | null;
  acceptedName: string | null;
  declineReason: string | null;
}
