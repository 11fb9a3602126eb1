import { expect, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../../seeds/demo-shop';

export type DemoRole = (typeof DEMO_PEOPLE)[number]['role'];

export const person = (role: DemoRole) => DEMO_PEOPLE.find((p) => p.role === role)!;

export async function signIn(page: Page, role: DemoRole, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(person(role).email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('signed-in-as')).toHaveText(person(role).name);
}

export async function shot(page: Page, name: string) {
  await page.screenshot({ path: `test-results/screens${process.env.E2E_PORT ? '-' + process.env.E2E_PORT : ''}/${name}.png`, fullPage: true });
}
