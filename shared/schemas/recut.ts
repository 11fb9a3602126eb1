/** Re-cuts: parts damaged at the saw, on their job's list until they are cut again or cancelled. */
import { z } from 'zod';
import { text } from './text';

export const RECUT_STATUSES = ['open', 'planned', 'cut', 'spoiled', 'cancelled'] as const;
export type RecutStatus = (typeof RECUT_STATUSES)[number];

export const RECUT_STATUS_LABELS: Record<RecutStatus, string> = {
  open: 'To re-cut',
  planned: 'In a released plan',
  cut: 'Cut',
  spoiled: 'Damaged again',
  cancelled: 'Cancelled',
};

export const cancelRecutSchema = z.strictObject({
  reason: text({ multiline: true })
    .min(1, 'Say why this re-cut is not needed (made from scrap, customer changed it…).')
    .max(500, 'At most 500 characters.'),
});

/** Which parts a Nest takes: the job's cut list, or only its open re-cuts. */
export const nestForSchema = z.enum(['cut-list', 'recuts'], { error: 'Nest the "cut-list" or the "recuts".' });
export type NestFor = z.infer<typeof nestForSchema>;

/** One re-cut as the job's list shows it. Lengths in mm. */
export interface RecutView {
  id: string;
  label: string;
  instance: number;
  quantity: number;
  length: number;
  width: number;
  thickness: number;
  material: string;
  grain: 'along-length' | 'any';
  reason: string;
  status: RecutStatus;
  sourcePlan: { id: string; name: string } | null;
  recutPlan: { id: string; name: string } | null;
  createdAt: string;
  createdBy: string | null;
  closedAt: string | null;
  closedBy: string | null;
  cancelReason: string;
}
