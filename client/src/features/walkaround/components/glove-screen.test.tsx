import 'fake-indexeddb/auto';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { buildChecklist, type Checklist } from '@yardcall/shared';
import { sampleCombination } from '@yardcall/shared/testing';
import { beforeAll, describe, expect, it } from 'vitest';
import { getOfflineRuntime } from '@/lib/offline';
import { ScriptedEngine, TypedInputEngine, type SpeechEngine } from '@/lib/speech';
import { renderWithProviders } from '@/testing/render';
import { getLocalInspection } from '../api/get-local-inspection';
import { GloveScreen, TARGET_CLASS } from './glove-screen';

let checklist: Checklist;

beforeAll(() => {
  checklist = buildChecklist(sampleCombination(), 'pre_trip', 'en');
});

async function storedWalkaround() {
  const clientId = crypto.randomUUID();
  await getOfflineRuntime().store.saveInspection({
    request: { clientId, vehicleIds: ['v1', 'v2'], kind: 'pre_trip', startedAt: new Date().toISOString() },
    vehicles: [{ id: 'v1', unitNumber: 'T-1', kind: 'tractor' }],
    checklist,
  });
  const walkaround = await getLocalInspection(clientId);
  if (!walkaround) throw new Error('not stored');
  return walkaround;
}

async function renderScreen(createEngine: () => SpeechEngine) {
  const walkaround = await storedWalkaround();
  renderWithProviders(<GloveScreen walkaround={walkaround} onFinished={() => undefined} createEngine={createEngine} />);
  return walkaround.inspection.clientId;
}

describe('the glove screen', () => {
  it('answers two stops by voice, shows the progress and saves each item and the resume point', async () => {
    const [first, second, third] = checklist.stops;
    const answered = [...(first?.itemKeys ?? []), ...(second?.itemKeys ?? [])];
    const clientId = await renderScreen(() => new ScriptedEngine(['good', 'good']));
    expect(screen.getByTestId('walkaround-item')).toHaveAttribute('data-stop-key', first?.key);
    expect(screen.getByTestId('stop-items')).toBeInTheDocument();
    await userEvent.click(screen.getByTestId('start-walkaround'));

    await waitFor(() =>
      expect(screen.getByTestId('walkaround-progress')).toHaveTextContent(
        `${answered.length} of ${checklist.items.length} done`,
      ),
    );
    expect(screen.getByTestId('walkaround-item')).toHaveAttribute('data-stop-key', third?.key);
    expect(screen.getByTestId('heard')).toHaveTextContent('Heard: “good”');
    const { store } = getOfflineRuntime();
    await waitFor(async () => {
      const results = await store.getResults(clientId);
      expect(results.map((r) => r.itemKey).sort()).toEqual([...answered].sort());
      expect(results.every((r) => r.upsert.answer === 'pass')).toBe(true);
      const stored = await store.getInspection(clientId);
      expect(stored?.voiceState).toMatchObject({ stopKey: third?.key });
    });
  });

  it('gives three targets at least 20 mm high (larger in glove mode) and takes typed answers', async () => {
    document.documentElement.classList.add('glove');
    const engine = new TypedInputEngine();
    await renderScreen(() => engine);
    await userEvent.click(screen.getByTestId('start-walkaround'));
    const targets = await screen.findAllByRole('button', { name: /^(All good|Defect|One by one)$/ });
    expect(targets).toHaveLength(3);
    for (const target of targets) {
      // 76 CSS px is 20 mm at 96 px per inch; glove mode raises it to at least 112 px.
      expect(target.className).toContain('min-h-[max(76px,4.75rem)]!');
      expect(target.className).toContain('[.glove_&]:min-h-[max(112px,5.5rem)]!');
    }
    expect(TARGET_CLASS).toContain('min-h-[max(76px');

    const first = checklist.stops[0]?.itemKeys.length ?? 0;
    await userEvent.type(screen.getByLabelText('Type your answer'), 'good');
    await userEvent.click(screen.getByRole('button', { name: 'Send' }));
    await waitFor(() => expect(screen.getByTestId('walkaround-progress')).toHaveTextContent(`${first} of`));

    // "Defect" at a stop asks which item; its button names it.
    const second = checklist.stops[1];
    const named = checklist.items.find((item) => item.key === second?.itemKeys[0]);
    await userEvent.click(screen.getByRole('button', { name: 'Defect' }));
    await userEvent.click(await screen.findByRole('button', { name: named?.name ?? 'missing' }));
    await waitFor(() =>
      expect(screen.getByTestId('walkaround-progress')).toHaveTextContent(
        `${first + (second?.itemKeys.length ?? 0)} of`,
      ),
    );
    expect(screen.getByText(/Add a photo of the defect/)).toBeInTheDocument();
  });

  it('jumps to an item chosen from the list and asks it', async () => {
    const engine = new TypedInputEngine();
    await renderScreen(() => engine);
    await userEvent.click(screen.getByTestId('start-walkaround'));
    await screen.findByRole('button', { name: 'All good' });
    const titles = checklist.items.map((item) => item.title);
    const target = checklist.items.find(
      (item, index) => index > 10 && titles.indexOf(item.title) === titles.lastIndexOf(item.title),
    );
    if (!target) throw new Error('The sample checklist has no item with a title of its own.');
    await userEvent.click(screen.getByRole('button', { name: /All items/ }));
    await screen.findByRole('heading', { name: 'All items' });
    await userEvent.click(screen.getByRole('button', { name: new RegExp(`^${target.title}`) }));
    await waitFor(() => expect(screen.getByTestId('walkaround-item')).toHaveAttribute('data-item-key', target.key));
    await waitFor(() => expect(engine.getSnapshot().prompt).toBe(target.prompt));
    // The list renders every item of the walk-around: slow in jsdom on a busy machine.
  }, 20_000);
});
