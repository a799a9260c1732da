import 'fake-indexeddb/auto';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { buildChecklist, sampleCombination, type Checklist } from '@yardcall/shared';
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
  it('answers three items by voice, shows the progress and saves each answer and the resume point', async () => {
    // The first items of the walk-around are plain checks, so "good" answers them.
    expect(checklist.items.slice(0, 3).map((item) => item.expects.type)).toEqual(['check', 'check', 'check']);
    const clientId = await renderScreen(() => new ScriptedEngine(['good', 'good', 'good']));
    expect(screen.getByTestId('walkaround-item')).toHaveAttribute('data-item-key', checklist.items[0]?.key);
    await userEvent.click(screen.getByTestId('start-walkaround'));

    await waitFor(() =>
      expect(screen.getByTestId('walkaround-progress')).toHaveTextContent(`3 of ${checklist.items.length} done`),
    );
    expect(screen.getByTestId('walkaround-item')).toHaveAttribute('data-item-key', checklist.items[3]?.key);
    expect(screen.getByTestId('heard')).toHaveTextContent('Heard: “good”');
    const { store } = getOfflineRuntime();
    await waitFor(async () => {
      const results = await store.getResults(clientId);
      expect(results.map((r) => r.itemKey).sort()).toEqual(
        checklist.items
          .slice(0, 3)
          .map((i) => i.key)
          .sort(),
      );
      expect(results.every((r) => r.upsert.answer === 'pass')).toBe(true);
      const stored = await store.getInspection(clientId);
      expect(stored?.voiceState).toMatchObject({ itemKey: checklist.items[3]?.key });
    });
  });

  it('gives three targets at least 20 mm high (larger in glove mode) and takes typed answers', async () => {
    document.documentElement.classList.add('glove');
    const engine = new TypedInputEngine();
    await renderScreen(() => engine);
    await userEvent.click(screen.getByTestId('start-walkaround'));
    const targets = await screen.findAllByRole('button', { name: /^(Good|Defect|Repeat)$/ });
    expect(targets).toHaveLength(3);
    for (const target of targets) {
      // 76 CSS px is 20 mm at 96 px per inch; glove mode raises it to at least 112 px.
      expect(target.className).toContain('min-h-[max(76px,4.75rem)]!');
      expect(target.className).toContain('[.glove_&]:min-h-[max(112px,5.5rem)]!');
    }
    expect(TARGET_CLASS).toContain('min-h-[max(76px');

    await userEvent.type(screen.getByLabelText('Type your answer'), 'good');
    await userEvent.click(screen.getByRole('button', { name: 'Send' }));
    await waitFor(() => expect(screen.getByTestId('walkaround-progress')).toHaveTextContent('1 of'));

    await userEvent.click(screen.getByRole('button', { name: 'Defect' }));
    await waitFor(() => expect(screen.getByTestId('walkaround-progress')).toHaveTextContent('2 of'));
    expect(screen.getByText(/Add a photo of the defect/)).toBeInTheDocument();
  });

  it('jumps to an item chosen from the list and asks it', async () => {
    const engine = new TypedInputEngine();
    await renderScreen(() => engine);
    await userEvent.click(screen.getByTestId('start-walkaround'));
    await screen.findByRole('button', { name: 'Good' });
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
