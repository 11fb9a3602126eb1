import type { Page } from '@playwright/test';
import { optimize } from '@/lib/nesting';
import { nestRequestSchema } from '@/shared/schemas/nesting';

export async function jobId(page: Page, name: string): Promise<string> {
  // The list is paged: search for the name (archived jobs too), then take the exact match.
  const { jobs }: { jobs: { id: string; name: string }[] } = await (
    await page.request.get(`/api/jobs?status=all&size=100&q=${encodeURIComponent(name)}`)
  ).json();
  const job = jobs.find((j) => j.name === name);
  if (!job) throw new Error(`No job named ${name}`);
  return job.id;
}

/**
 * Saves a new draft plan of a job the way the Nest does (nested by the real engine on the stock the job's nest
 * request offers, then POSTed for the server to judge), signed in as `page`'s user (one who may nest). Returns its id.
 */
export async function saveDraftPlan(page: Page, job: string, name: string): Promise<string> {
  const id = await jobId(page, job);
  const res = await page.request.get(`/api/jobs/${id}/nest-request`);
  if (!res.ok()) throw new Error(`nest-request answered ${res.status()}`);
  const request = nestRequestSchema.parse({ ...(await res.json()), settings: { ...(await res.json()).settings, timeBudgetMs: 0 } });
  const plan = await optimize(request);
  const saved = await page.request.post(`/api/jobs/${id}/plans`, {
    data: { name, settings: { timeBudgetMs: 0 }, stockIds: request.stock.map((s) => s.id), plan },
  });
  if (saved.status() !== 201) throw new Error(`saving the draft answered ${saved.status()}: ${await saved.text()}`);
  return (await saved.json()).id;
}
