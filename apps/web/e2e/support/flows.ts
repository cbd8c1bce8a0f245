import type { Page } from 'playwright-core';

export const demo = {
  admin: { email: 'maren.holt@brackwater.example', password: 'limitbook-admin', name: 'Maren Holt' },
  author: { email: 'idris.okafor@brackwater.example', password: 'limitbook-author', name: 'Idris Okafor' },
  reader: { email: 'tomas.wren@brackwater.example', password: 'limitbook-reader', name: 'Tomas Wren' },
  reviewer: { email: 'sunniva.lind@brackwater.example', password: 'limitbook-reviewer', name: 'Sunniva Lind' },
} as const;

export async function signIn(page: Page, email: string, password: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel(/^Password/).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main navigation' }).waitFor();
}

export async function signOut(page: Page, name: string) {
  await page.getByRole('button', { name: `Account menu for ${name}` }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.getByRole('heading', { name: 'Sign in' }).waitFor();
}
