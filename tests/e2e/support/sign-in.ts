import { expect, type Page } from '@playwright/test';

/** Goes through the local sign-in stand-in as one of the demo people, from whatever page offers "Sign in". */
export async function signInAs(page: Page, personName: string, startLink: RegExp = /sign in/i): Promise<void> {
  await page.getByRole('link', { name: startLink }).first().click();
  await page.getByRole('button', { name: new RegExp(personName) }).click();
  await expect(page.getByText(personName).first()).toBeVisible();
}
