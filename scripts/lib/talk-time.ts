// The modelled talk time of a whole pre-trip by voice: the demo tractor and its 2-axle trailer, walked
// in real Chromium with the scripted speech fake answering as a competent driver does ("good" at each
// stop, a value only where one is asked). Talk time = the app's spoken words at 2.8 words a second
// (about 170 a minute) plus 2.0 s for each of the driver's answers (speech plus the recogniser
// deciding the driver stopped). Our own model for comparing versions, not a measured walk.
import { chromium } from '@playwright/test';
import type { InspectionPage, InspectionResponse } from '@yardcall/shared';
import { installFakeSpeech } from '../../client/e2e/fake-speech.js';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../client/e2e/chromium.js';
import { signInToken } from './first-load.js';

export const WORDS_PER_SECOND = 2.8;
export const SECONDS_PER_ANSWER = 2.0;
const POWER_UNIT = 'KV-101';
const TRAILER = 'KV-T21';

export interface TalkTime {
  prompts: number;
  words: number;
  answers: number;
  items: number;
  itemsOnServer: number;
  minutes: number;
}

// Words as a listener hears them: anything with a letter or a digit.
export function countSpokenWords(sentences: readonly string[]): number {
  return sentences.reduce(
    (sum, sentence) => sum + sentence.split(/\s+/).filter((word) => /[\p{L}\p{N}]/u.test(word)).length,
    0,
  );
}

export function modelledMinutes(words: number, answers: number): number {
  return (words / WORDS_PER_SECOND + answers * SECONDS_PER_ANSWER) / 60;
}

export async function measureTalkTime(baseUrl: string): Promise<TalkTime> {
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
  });
  try {
    const token = await signInToken(baseUrl, 'driver@yardcall.test');
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });
    await context.addInitScript(`localStorage.setItem('yardcall.token', ${JSON.stringify(token)});`);
    const page = await context.newPage();
    await installFakeSpeech(page, { answerTurns: null, skipAt: null, noteAt: null, lowTreadKey: null });
    await page.goto(`${baseUrl}/driver/start`);
    const picker = page.getByTestId('vehicle-picker');
    await picker.getByRole('button', { name: new RegExp(POWER_UNIT) }).click();
    await page.getByRole('button', { name: new RegExp(TRAILER) }).click();
    await page.getByTestId('glove-screen').waitFor();
    const clientId = decodeURIComponent(new URL(page.url()).pathname.split('/').pop() ?? '');
    await page.getByTestId('start-walkaround').click();
    await page.getByRole('heading', { level: 1, name: 'Finish and sign' }).waitFor({ timeout: 300_000 });
    const { spoken, turns } = await page.evaluate(() => {
      const w = window as unknown as { __spoken: string[]; __speechTurns: { answer: string | null }[] };
      return { spoken: w.__spoken, turns: w.__speechTurns };
    });
    const answers = turns.filter((turn) => turn.answer !== null).length;
    const words = countSpokenWords(spoken);

    // Every item reaches the server: read the walk-around back once its answers have synced.
    const headers = { Authorization: `Bearer ${token}` };
    const deadline = Date.now() + 60_000;
    let detail: InspectionResponse | undefined;
    while (Date.now() < deadline) {
      const list = (await (await fetch(`${baseUrl}/api/inspections`, { headers })).json()) as InspectionPage;
      for (const item of list.items) {
        const read = (await (
          await fetch(`${baseUrl}/api/inspections/${item.id}`, { headers })
        ).json()) as InspectionResponse;
        if (read.clientId === clientId) detail = read;
      }
      if (detail && detail.results.length === detail.checklist.items.length) break;
      await new Promise((resolve) => setTimeout(resolve, 500));
    }
    await context.close();
    return {
      prompts: spoken.length,
      words,
      answers,
      items: detail?.checklist.items.length ?? 0,
      itemsOnServer: detail?.results.length ?? 0,
      minutes: Math.round(modelledMinutes(words, answers) * 100) / 100,
    };
  } finally {
    await browser.close();
  }
}
