import { act, renderHook } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';

// A service worker registration as the browser hands it out, with a new version waiting or arriving.
function fakeWorker() {
  const worker = new EventTarget() as EventTarget & { state: string; postMessage: ReturnType<typeof vi.fn> };
  worker.state = 'installing';
  worker.postMessage = vi.fn();
  return worker;
}

function fakeRegistration(waiting: ReturnType<typeof fakeWorker> | null) {
  const registration = new EventTarget() as EventTarget & {
    waiting: ReturnType<typeof fakeWorker> | null;
    installing: ReturnType<typeof fakeWorker> | null;
    update: () => Promise<void>;
  };
  registration.waiting = waiting;
  registration.installing = null;
  registration.update = () => Promise.resolve();
  return registration;
}

async function loadWith(registration: ReturnType<typeof fakeRegistration>, controlled: boolean) {
  vi.resetModules();
  const container = Object.assign(new EventTarget(), {
    controller: controlled ? {} : null,
    register: vi.fn(() => Promise.resolve(registration)),
  });
  Object.defineProperty(navigator, 'serviceWorker', { value: container, configurable: true });
  const module = await import('./app-update');
  module.registerAppServiceWorker();
  await vi.waitFor(() => expect(container.register).toHaveBeenCalledWith('/service-worker.js', { scope: '/' }));
  await Promise.resolve();
  return { module, container };
}

afterEach(() => {
  Reflect.deleteProperty(navigator, 'serviceWorker');
});

describe('app updates between walk-arounds', () => {
  it('offers a version that waits, and applies it only when accepted', async () => {
    const waiting = fakeWorker();
    const { module } = await loadWith(fakeRegistration(waiting), true);
    const { result } = renderHook(() => module.useAppUpdate());
    await vi.waitFor(() => expect(result.current.ready).toBe(true));
    expect(waiting.postMessage).not.toHaveBeenCalled();

    act(() => result.current.apply());
    expect(waiting.postMessage).toHaveBeenCalledWith({ type: 'SKIP_WAITING' });
  });

  it('offers a version installed while the app runs, once it has installed', async () => {
    const registration = fakeRegistration(null);
    const { module } = await loadWith(registration, true);
    const { result } = renderHook(() => module.useAppUpdate());
    const arriving = fakeWorker();
    registration.installing = arriving;
    act(() => void registration.dispatchEvent(new Event('updatefound')));
    expect(result.current.ready).toBe(false);
    arriving.state = 'installed';
    act(() => void arriving.dispatchEvent(new Event('statechange')));
    expect(result.current.ready).toBe(true);
  });

  it('offers nothing on the first install, which takes the page at once', async () => {
    const { module } = await loadWith(fakeRegistration(fakeWorker()), false);
    const { result } = renderHook(() => module.useAppUpdate());
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(result.current.ready).toBe(false);
  });
});
