import type { Page } from '@playwright/test';
import { expect } from './guard';

const escaped = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/**
 * Waits until the last message the app showed is of `kind` and contains `text`. The message area keeps the last
 * message as data-last-message after an information message fades (about 4 s), so the check holds however late it
 * runs; a later message in its place fails it.
 */
export async function expectLastMessage(page: Page, kind: 'info' | 'error', text: string): Promise<void> {
  await expect(page.getByTestId('message-area')).toHaveAttribute('data-last-message', new RegExp(`^${kind}: .*${escaped(text)}`, 's'));
}
