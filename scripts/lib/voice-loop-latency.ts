// A whole walk-around by voice in real Chromium with the scripted speech fake: how long from the end
// of an answer to the start of the next prompt, and how many bytes a minute of voice note takes
// from Chromium's MediaRecorder fed by the fake microphone.
import { join } from 'node:path';
import { chromium } from '@playwright/test';
import type { InspectionPage, InspectionResponse } from '@yardcall/shared';
import { installFakeSpeech } from '../../client/e2e/fake-speech.js';
import { singleFigure, timingFigure, type BenchFigure } from '../../shared/src/bench/index.js';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../client/e2e/chromium.js';
import { signInToken } from './first-load.js';
import { projectRoot } from './run.js';

const NOTE_WAV = join(projectRoot, 'test-audio', 'fixtures', 'en-note-cracked-marker-lens.wav');
// A straight truck: no trailer question, so one tap starts the walk-around.
const UNIT = 'KV-S31';
const NOTE_MS = 20_000;

// Each answer pairs with the first prompt that starts after it and before the next answer; an
// answer that starts a note (no prompt follows until the note ends) has no pair.
export function answerToPromptLatencies(answeredAt: readonly number[], promptedAt: readonly number[]): number[] {
  const latencies: number[] = [];
  let p = 0;
  answeredAt.forEach((answer, i) => {
    const nextAnswer = answeredAt[i + 1] ?? Number.POSITIVE_INFINITY;
    while (p < promptedAt.length && (promptedAt[p] ?? 0) < answer) p += 1;
    const prompt = promptedAt[p];
    if (prompt !== undefined && prompt < nextAnswer) latencies.push(prompt - answer);
  });
  return latencies;
}

export async function measureVoiceLoop(baseUrl: string): Promise<BenchFigure[]> {
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: [
      ...CHROMIUM_ARGS,
      '--use-fake-ui-for-media-stream',
      '--use-fake-device-for-media-stream',
      `--use-file-for-fake-audio-capture=${NOTE_WAV}`,
    ],
  });
  try {
    const token = await signInToken(baseUrl, 'driver@yardcall.test');
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });
    await context.addInitScript(`localStorage.setItem('yardcall.token', ${JSON.stringify(token)});`);
    const page = await context.newPage();
    await installFakeSpeech(page, { answerTurns: null, skipAt: null, noteAt: 5, lowTreadKey: null, noteMs: NOTE_MS });
    await page.goto(`${baseUrl}/driver/start`);
    await page
      .getByTestId('vehicle-picker')
      .getByRole('button', { name: new RegExp(UNIT) })
      .click();
    await page.getByTestId('glove-screen').waitFor();
    const clientId = decodeURIComponent(new URL(page.url()).pathname.split('/').pop() ?? '');
    await page.getByTestId('start-walkaround').click();
    await page.getByRole('heading', { level: 1, name: 'Finish and sign' }).waitFor({ timeout: 300_000 });
    const { answeredAt, promptedAt } = await page.evaluate(() => {
      const w = window as unknown as { __answeredAt: number[]; __promptedAt: number[] };
      return { answeredAt: w.__answeredAt, promptedAt: w.__promptedAt };
    });
    const latencies = answerToPromptLatencies(answeredAt, promptedAt);
    const figures = [
      timingFigure(
        `voice loop in Chromium, end of answer to next prompt (${latencies.length} turns, scripted engine)`,
        latencies,
        50,
      ),
    ];

    // The note syncs in the background; read its size and length off the server.
    const headers = { Authorization: `Bearer ${token}` };
    const deadline = Date.now() + 60_000;
    let note: InspectionResponse['notes'][number] | undefined;
    while (!note && Date.now() < deadline) {
      const list = (await (await fetch(`${baseUrl}/api/inspections`, { headers })).json()) as InspectionPage;
      for (const item of list.items) {
        const detail = (await (
          await fetch(`${baseUrl}/api/inspections/${item.id}`, { headers })
        ).json()) as InspectionResponse;
        if (detail.clientId === clientId) note = detail.notes[0];
      }
      if (!note) await new Promise((resolve) => setTimeout(resolve, 500));
    }
    if (!note) throw new Error('The voice note did not reach the server within 60 s.');
    const kbPerMinute = Math.round((note.sizeBytes / 1024 / (note.durationMs / 60_000)) * 10) / 10;
    figures.push(
      singleFigure(
        `voice-note bytes a minute (${note.mimeType}, ${(note.durationMs / 1000).toFixed(1)} s note)`,
        'KB',
        kbPerMinute,
        250,
      ),
    );
    await context.close();
    return figures;
  } finally {
    await browser.close();
  }
}
