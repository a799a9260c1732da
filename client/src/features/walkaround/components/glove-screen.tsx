import { Suspense, lazy, useEffect, useMemo, useRef, useState, type ChangeEvent } from 'react';
import { useTranslation } from 'react-i18next';
import type { ChecklistStop, ItemResult, Locale } from '@yardcall/shared';
import { ErrorAlert, Notice } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { describeError } from '@/lib/errors';
import { getOfflineRuntime, useSyncStatus, type JsonValue } from '@/lib/offline';
import { resizePhoto, startRecording, type NoteRecording } from '@/lib/recorder';
import {
  TypedInputEngine,
  chooseSpeechEngine,
  createListeningSwitch,
  createOfflineNoticeOnce,
  listenByTapWhenOffline,
  listeningUnavailable,
  recognitionNeedsNetwork,
  useOnline,
  type SpeechEngine,
} from '@/lib/speech';
import type { LocalWalkaround } from '@/lib/offline';
import { NOTE_MAX_MS, VOICE_LOOP_WORDS, restoreVoiceLoop, useVoiceLoop } from '../voice-loop';
import { observeEngine } from './observed-engine';
import { SafetyCaution } from '@/components/ui/safety-caution';
import { useMediaSession } from './use-media-session';
import { useSwipe, type SwipeDirection } from './use-swipe';
import { useWakeLock } from './use-wake-lock';
import { TypedInputForm } from '@/components/ui/typed-input-form';

// The list and its dialog code load on first opening, off the run screen's first load.
const ItemListDialog = lazy(async () => ({ default: (await import('./item-list-dialog')).ItemListDialog }));

// The voice loop ends a note at its longest length and says so; the recorder stops a little later
// only if the loop could not.
const RECORDER_BACKSTOP_MS = NOTE_MAX_MS + 5_000;

// At least 20 mm (about 76 CSS px) high and 8 mm (about 31 px) apart; bigger in glove mode. Marked
// important: the button's own minimum heights would otherwise win by their place in the stylesheet.
export const TARGET_CLASS = 'min-h-[max(76px,4.75rem)]! [.glove_&]:min-h-[max(112px,5.5rem)]! w-full text-3xl';
export const TARGET_GAP_CLASS = 'gap-[max(31px,2rem)]';

// The stop's own prompt is what the card already shows; anything else said with it (a value said
// back, a defect noted, a question) is shown under it.
function saysOnlyTheStop(prompt: string, stop: ChecklistStop | undefined, zoneTitle: string): boolean {
  if (!stop) return false;
  return [stop.prompt, stop.shortPrompt, `${zoneTitle}. ${stop.prompt}`].includes(prompt);
}

// The words a button stands for, from the same list the recogniser is biased towards.
function buttonWords(locale: Locale) {
  const [good = 'good', defect = 'defect', yes = 'yes', no = 'no'] = VOICE_LOOP_WORDS[locale].phrases;
  return { good, defect, yes, no };
}

export interface GloveScreenProps {
  walkaround: LocalWalkaround;
  onFinished: () => void;
  // Tests pass a scripted engine; the app picks the browser's own speech or typed input.
  createEngine?: () => SpeechEngine;
}

// The screen of the walk-around itself: the current item in large text, three big targets, and the
// voice loop running underneath. Every answer and the loop's state go to this device's store first.
export function GloveScreen({ walkaround, onFinished, createEngine }: GloveScreenProps) {
  const { t } = useTranslation();
  const { inspection } = walkaround;
  const { clientId } = inspection;
  // Kept from the first read: a new checklist object would end the running loop.
  const [checklist] = useState(inspection.checklist);
  // What the loop says in each language; the screen shows the walk-around's own.
  const [spokenChecklist] = useState(
    () => (locale: Locale) =>
      locale === checklist.locale ? checklist : (inspection.spokenChecklists?.[locale] ?? checklist),
  );
  const { store } = getOfflineRuntime();
  const sync = useSyncStatus();
  const [baseEngine, setBaseEngine] = useState<SpeechEngine>(() =>
    createEngine ? createEngine() : chooseSpeechEngine(window),
  );
  const [prompt, setPrompt] = useState<string | null>(null);
  const [heard, setHeard] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [lastDefect, setLastDefect] = useState<ItemResult | null>(null);
  const [listOpen, setListOpen] = useState(false);
  const startWhenReady = useRef(false);
  const screenRef = useRef<HTMLDivElement>(null);
  const resultWrites = useRef(new Set<Promise<unknown>>());
  const resultIds = useRef(new Map(walkaround.results.map((r) => [r.itemKey, r.clientId])));
  const recording = useRef<{ itemKey: string; pending: Promise<NoteRecording | null> } | null>(null);
  const commandRef = useRef<(command: 'end_note') => void>(() => undefined);

  // With no signal and a recogniser that needs one, turns wait for a tap, a swipe or a headset
  // button while the prompts are still spoken; the driver is told once.
  const online = useOnline();
  const [needsNetwork, setNeedsNetwork] = useState(false);
  const listeningOff = listeningUnavailable(online, needsNetwork);
  const [listening] = useState(createListeningSwitch);
  const [offlineNotice] = useState(createOfflineNoticeOnce);
  useEffect(() => {
    let current = true;
    void recognitionNeedsNetwork(baseEngine, checklist.locale).then((needs) => {
      if (current) setNeedsNetwork(needs);
    });
    return () => {
      current = false;
    };
  }, [baseEngine, checklist.locale]);
  const engine = useMemo(
    () =>
      observeEngine(
        listenByTapWhenOffline(baseEngine, {
          unavailable: () => listening.isOff(),
          onUnavailable: (locale) => {
            const notice = offlineNotice(locale);
            if (!notice) return;
            setNotice(notice.shown);
            void baseEngine.speak(notice.spoken, { locale });
          },
        }),
        { onSpoken: setPrompt, onHeard: setHeard },
      ),
    [baseEngine, offlineNotice, listening],
  );
  // Resume at the stored item after a reload; a state that no longer fits the checklist starts afresh.
  const [initialState] = useState(() =>
    inspection.voiceState === undefined
      ? undefined
      : (restoreVoiceLoop(
          inspection.voiceState,
          checklist,
          walkaround.results.map(({ upsert: { clientId: _id, ...result } }) => result),
        ) ?? undefined),
  );

  const startNote = (itemKey: string) => {
    const pending = startRecording({ maxMs: RECORDER_BACKSTOP_MS })
      .then((rec) => {
        // Stopped by silence or its length: end the note in the loop too, which saves it.
        void rec.finished.then((note) => {
          if (note.stoppedBy !== 'call' && recording.current?.pending === pending) commandRef.current('end_note');
        });
        return rec;
      })
      .catch(() => {
        setNotice(t('walkaround.run.noRecorder'));
        return null;
      });
    recording.current = { itemKey, pending };
  };

  const finishNote = async (heardWords: string) => {
    const current = recording.current;
    recording.current = null;
    if (!current) return;
    const rec = await current.pending;
    if (!rec) return;
    const note = await rec.stop();
    await store.saveNote({
      clientId: crypto.randomUUID(),
      inspectionClientId: clientId,
      itemKey: current.itemKey,
      audio: note.blob,
      mimeType: note.mimeType,
      durationMs: note.durationMs,
      heard: heardWords,
    });
    setNotice(t('walkaround.run.noteSaved'));
  };

  const voice = useVoiceLoop({
    engine,
    checklist: spokenChecklist,
    initialState,
    locale: initialState?.locale ?? checklist.locale,
    requiredReadings: inspection.requiredReadings,
    host: {
      onResult: async (result) => {
        let id = resultIds.current.get(result.itemKey);
        if (!id) {
          id = crypto.randomUUID();
          resultIds.current.set(result.itemKey, id);
        }
        // The photo button stays with the last defect named, whatever passes the same stop saved after it.
        if (result.answer === 'defect' && !result.fixed) setLastDefect(result);
        const write = store.saveResults(clientId, [{ ...result, clientId: id }]);
        resultWrites.current.add(write);
        try {
          await write;
        } finally {
          resultWrites.current.delete(write);
        }
      },
      onState: (state) => {
        // The loop's state is plain JSON: stored as it is, read back on reload.
        store
          .saveVoiceState(clientId, state as unknown as JsonValue)
          .catch((error: unknown) => setProblem(describeError(error)));
      },
      onStartNote: (itemKey) => startNote(itemKey),
      onStopNote: (_itemKey, words) => finishNote(words),
      // A stop's answers are still being written when the last one finishes the walk-around: the
      // finish screen reads them from the store, so it opens once they are there.
      onFinish: () => void Promise.allSettled([...resultWrites.current]).then(() => onFinished()),
      onHostError: (error) => setProblem(describeError(error)),
    },
  });
  useEffect(() => {
    commandRef.current = voice.command;
  });

  // Signal back while a turn waits for a tap: say the question again and listen.
  const { start: restart, running } = voice;
  useEffect(() => {
    if (listening.set(listeningOff) && running) restart();
  }, [listening, listeningOff, running, restart]);

  // After switching to typed answers, carry on from where the loop stopped.
  const { start } = voice;
  useEffect(() => {
    if (!startWhenReady.current) return;
    startWhenReady.current = false;
    start();
  }, [start]);

  const { state, item, currentStop: stop } = voice;
  const phase = state.phase;
  const words = buttonWords(state.locale);
  const done = Object.keys(state.results).length;
  const total = checklist.items.length;
  const zoneTitle = checklist.zones.find((zone) => zone.key === stop?.zone)?.title ?? '';
  const started = voice.running || !['idle', 'stalled'].includes(phase);
  // The stop is asked as a whole until the driver goes one by one or one item is asked on its own.
  const atStop = state.current === null;
  const stopItems = stop ? checklist.items.filter((i) => i.stopKey === stop.key) : [];
  const whichItems =
    phase === 'choosing' && state.which
      ? state.which.candidates.flatMap((key) => checklist.items.filter((i) => i.key === key))
      : [];
  const mode = atStop ? 'stop' : state.current?.reading ? 'reading' : 'item';
  const safetyHere = atStop ? stopItems.some((i) => i.safety) : item?.safety;

  const act = (direction: SwipeDirection | 'note') => {
    if (!voice.running) return;
    if (direction === 'note') return voice.command(phase === 'noting' ? 'end_note' : 'note');
    if (direction === 'down') return voice.command('repeat');
    const choosing = phase === 'confirming' || phase === 'offering';
    if (direction === 'right') voice.answer(choosing ? words.yes : words.good);
    else voice.answer(choosing ? words.no : words.defect);
  };
  const swipe = useSwipe(act);

  useWakeLock(voice.running);
  useMediaSession(started, {
    pause: () => voice.command('pause'),
    resume: () => (voice.running ? voice.command('resume') : voice.start()),
    skip: () => voice.command('skip'),
    back: () => voice.command('back'),
  });

  const addPhoto = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file || !lastDefect) return;
    try {
      const image = await resizePhoto(file);
      await store.savePhoto({
        clientId: crypto.randomUUID(),
        inspectionClientId: clientId,
        itemKey: lastDefect.itemKey,
        image,
        mimeType: image.type || 'image/jpeg',
      });
      setNotice(t('walkaround.run.photoSaved'));
    } catch (error) {
      setProblem(describeError(error));
    }
  };

  const choosing = phase === 'confirming' || phase === 'offering';
  const lastDefectItem = lastDefect ? checklist.items.find((i) => i.key === lastDefect.itemKey) : undefined;

  return (
    <div ref={screenRef} className="flex scroll-mt-2 flex-col gap-4" data-testid="glove-screen">
      <h1 className="sr-only">{t('walkaround.run.title')}</h1>
      <p className="flex flex-wrap justify-between gap-2 text-lg font-bold" data-testid="walkaround-progress">
        <span>{t('walkaround.run.progress', { done, total })}</span>
        <span>{zoneTitle}</span>
      </p>

      <section
        aria-live="polite"
        aria-label={t('walkaround.run.current')}
        data-testid="walkaround-item"
        data-stop-key={stop?.key ?? ''}
        data-stop-items={stop?.itemKeys.join(' ') ?? ''}
        data-item-key={atStop ? '' : (item?.key ?? '')}
        data-mode={mode}
        data-expects={!atStop && item?.expects.type === 'measure' ? item.expects.quantity : atStop ? 'stop' : 'check'}
        data-phase={phase}
        className="touch-pan-y select-none rounded-xl border-4 border-line bg-surface p-4"
        {...swipe}
      >
        {atStop ? null : <p className="text-lg font-bold">{item?.positionLabel}</p>}
        <p className="text-3xl leading-tight font-bold hyphens-auto [overflow-wrap:break-word]">
          {atStop ? stop?.label : item?.title}
        </p>
        {atStop && !['confirming', 'choosing', 'offering', 'finished'].includes(phase) ? (
          <ul className="mt-2 flex flex-wrap gap-x-4 text-xl" data-testid="stop-items">
            {stopItems.map((i) => (
              <li key={i.key}>{i.name}</li>
            ))}
          </ul>
        ) : null}
        {phase === 'confirming' && state.pending ? (
          <p className="mt-2 text-2xl font-bold">{state.pending.question}</p>
        ) : null}
        {phase === 'choosing' && state.which ? (
          <p className="mt-2 text-2xl font-bold">
            {state.which.detail.trim() === ''
              ? t('walkaround.run.whichPlain')
              : t('walkaround.run.which', { detail: state.which.detail })}
          </p>
        ) : null}
        {phase === 'offering' || phase === 'paused' || phase === 'noting' ? (
          <p className="mt-2 text-2xl font-bold">{t(`walkaround.run.phase.${phase}`)}</p>
        ) : null}
        {prompt && started && !(atStop && phase === 'asking' && saysOnlyTheStop(prompt, stop, zoneTitle)) ? (
          <p className="mt-2 text-base">{prompt}</p>
        ) : null}
        <p className="mt-2 text-lg" data-testid="heard">
          {heard ? t('walkaround.run.heard', { heard }) : t('walkaround.run.heardNothing')}
        </p>
      </section>

      {!voice.running && phase !== 'finished' ? (
        <Button
          size="large"
          className={TARGET_CLASS}
          onClick={() => {
            voice.start();
            // The item and the three targets fill the phone; the app's header scrolls away.
            screenRef.current?.scrollIntoView?.({ block: 'start' });
          }}
          data-testid="start-walkaround"
        >
          {phase === 'idle' && done === 0 ? t('walkaround.run.start') : t('walkaround.run.resume')}
        </Button>
      ) : null}

      {voice.running && phase === 'paused' ? (
        <Button size="large" className={TARGET_CLASS} onClick={() => voice.command('resume')}>
          {t('walkaround.run.resume')}
        </Button>
      ) : null}

      {voice.running && phase === 'noting' ? (
        <Button size="large" className={TARGET_CLASS} onClick={() => voice.command('end_note')}>
          {t('walkaround.run.endNote')}
        </Button>
      ) : null}

      {voice.running && phase === 'choosing' ? (
        <div className={`flex flex-col ${TARGET_GAP_CLASS}`} data-testid="targets">
          {whichItems.map((i) => (
            <Button
              key={i.key}
              size="large"
              variant="danger"
              className={TARGET_CLASS}
              onClick={() => voice.answer(i.name)}
            >
              {i.name}
            </Button>
          ))}
          <Button size="large" variant="secondary" className={TARGET_CLASS} onClick={() => voice.command('one_by_one')}>
            {t('walkaround.run.oneByOne')}
          </Button>
        </div>
      ) : null}

      {voice.running && (phase === 'asking' || choosing) ? (
        <div className={`flex flex-col ${TARGET_GAP_CLASS}`} data-testid="targets">
          <Button size="large" className={TARGET_CLASS} onClick={() => act('right')}>
            {choosing ? t('walkaround.run.yes') : atStop ? t('walkaround.run.allGood') : t('walkaround.run.good')}
          </Button>
          <Button size="large" variant="danger" className={TARGET_CLASS} onClick={() => act('left')}>
            {choosing ? t('walkaround.run.no') : t('walkaround.run.defect')}
          </Button>
          {phase === 'asking' && atStop ? (
            <Button
              size="large"
              variant="secondary"
              className={TARGET_CLASS}
              onClick={() => voice.command('one_by_one')}
            >
              {t('walkaround.run.oneByOne')}
            </Button>
          ) : (
            <Button size="large" variant="secondary" className={TARGET_CLASS} onClick={() => act('down')}>
              {t('walkaround.run.repeat')}
            </Button>
          )}
        </div>
      ) : null}

      {baseEngine instanceof TypedInputEngine ? (
        <TypedInputForm
          engine={baseEngine}
          label={t('walkaround.run.typedLabel')}
          sendLabel={t('walkaround.run.typedSend')}
          testId="typed-answer"
        />
      ) : null}

      {safetyHere && started ? <SafetyCaution /> : null}
      {problem ? <ErrorAlert>{problem}</ErrorAlert> : null}
      {notice ? <Notice>{notice}</Notice> : null}
      {voice.speechFailure ? (
        <ErrorAlert>
          <p>{voice.speechFailure.shown}</p>
          <div className="mt-2 flex flex-wrap gap-tap-gap">
            <Button onClick={() => voice.start()}>{t('walkaround.run.tryAgain')}</Button>
            <Button
              variant="secondary"
              onClick={() => {
                setBaseEngine(new TypedInputEngine());
                startWhenReady.current = true;
              }}
            >
              {t('walkaround.run.typeInstead')}
            </Button>
          </div>
        </ErrorAlert>
      ) : null}

      {lastDefect && lastDefectItem ? (
        <label className="inline-flex min-h-tap cursor-pointer items-center justify-center rounded-lg border-2 border-line bg-surface px-4 text-center text-xl font-bold focus-within:outline-3">
          {t('walkaround.run.photo', { item: `${lastDefectItem.title}, ${lastDefectItem.positionLabel}` })}
          <input
            type="file"
            accept="image/*"
            capture="environment"
            className="sr-only"
            onChange={(event) => void addPhoto(event)}
          />
        </label>
      ) : null}

      <div className="grid grid-cols-1 gap-tap-gap min-[480px]:grid-cols-3">
        <Button variant="secondary" disabled={!voice.running} onClick={() => act('note')}>
          {phase === 'noting' ? t('walkaround.run.endNote') : t('walkaround.run.note')}
        </Button>
        <Button variant="secondary" onClick={() => setListOpen(true)}>
          {t('walkaround.run.list', { skipped: state.skipped.length })}
        </Button>
        <Button variant="secondary" onClick={onFinished}>
          {t('walkaround.run.finish')}
        </Button>
      </div>

      <p className="text-lg" data-testid="sync-status">
        {sync.waiting > 0 ? t('walkaround.run.waiting', { count: sync.waiting }) : t('walkaround.run.allSynced')}
      </p>
      <p className="text-base">{t('walkaround.run.gestures')}</p>

      {listOpen ? (
        <Suspense fallback={null}>
          <ItemListDialog
            open
            onClose={() => setListOpen(false)}
            checklist={checklist}
            results={state.results}
            skipped={state.skipped}
            currentKey={state.itemKey}
            onJump={(key) => (voice.running ? voice.jump(key) : undefined)}
          />
        </Suspense>
      ) : null}
    </div>
  );
}
