// The form's draft in localStorage: every keystroke is kept, so a closed tab, a reload or a lost
// signal loses nothing. Photos cannot be kept there (files are not storable); the form says so.
export const STEP_KEYS = ["rider", "riding", "bike", "feel", "review"] as const;
export type StepKey = (typeof STEP_KEYS)[number];

export interface Draft {
  version: 1;
  step: number;
  /** The furthest step reached: the indicator lets the rider go back to any step up to it. */
  reached: number;
  values: Partial<Record<StepKey, Record<string, unknown>>>;
  /** How many photos were picked: the files themselves cannot be kept, only the fact that there were some. */
  photoCount?: number;
  savedAt: string;
}

const KEY = "sagwise.request-draft.v1";

export function emptyDraft(): Draft {
  return { version: 1, step: 0, reached: 0, values: {}, savedAt: new Date().toISOString() };
}

export function loadDraft(): Draft | null {
  try {
    const raw = window.localStorage.getItem(KEY);
    if (!raw) return null;
    const draft = JSON.parse(raw) as Draft;
    if (draft.version !== 1 || typeof draft.step !== "number" || typeof draft.values !== "object") return null;
    return draft;
  } catch {
    return null;
  }
}

export function saveDraft(draft: Draft): void {
  try {
    window.localStorage.setItem(KEY, JSON.stringify({ ...draft, savedAt: new Date().toISOString() }));
  } catch {
    // Private mode or a full storage: the form still works, only the draft is not kept.
  }
}

export function clearDraft(): void {
  try {
    window.localStorage.removeItem(KEY);
  } catch {
    // Nothing to clear.
  }
}
