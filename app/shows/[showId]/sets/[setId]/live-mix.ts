"use client";
// The box mix of a drag in progress, outside React state: only the panels that show it re-render
// on each frame, never the editor or the field.
import { useSyncExternalStore } from "react";
import type { PreviewMix } from "./use-preview";

export interface LiveMix {
  get(): PreviewMix | null;
  set(mix: PreviewMix | null): void;
  subscribe(listener: () => void): () => void;
}

export function createLiveMix(): LiveMix {
  let value: PreviewMix | null = null;
  const listeners = new Set<() => void>();
  return {
    get: () => value,
    set(mix) {
      value = mix;
      listeners.forEach((l) => l());
    },
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}

export function useLiveMix(store: LiveMix): PreviewMix | null {
  return useSyncExternalStore(store.subscribe, store.get, () => null);
}
