import { setupValuesSchema } from '../shared/types/setups';
import { z } from '../shared/types/zod';

/** An unsaved draft kept in this browser tab, so the browser's back button cannot lose it. */
const storedDraftSchema = z.object({
  base: z.object({ id: z.number().int(), number: z.number().int(), values: setupValuesSchema }),
  values: setupValuesSchema,
  note: z.string(),
});
export type StoredDraft = z.infer<typeof storedDraftSchema>;

// The browser's back button resets the navigator without a beforeRemove event, so on the web an
// unsaved draft is also kept in this tab's sessionStorage and comes back when the editor reopens.
function draftStore(): Storage | null {
  try {
    return typeof window !== 'undefined' && window.sessionStorage ? window.sessionStorage : null;
  } catch {
    return null; // storage switched off in the browser: the leave warnings still stand
  }
}

const storageKey = (setupId: number) => `tunefork.editor-draft.${setupId}`;

export function readStoredDraft(setupId: number): StoredDraft | null {
  try {
    const raw = draftStore()?.getItem(storageKey(setupId));
    const parsed = raw ? storedDraftSchema.safeParse(JSON.parse(raw)) : null;
    return parsed?.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export function writeStoredDraft(setupId: number, draft: StoredDraft | null): void {
  try {
    if (draft) draftStore()?.setItem(storageKey(setupId), JSON.stringify(draft));
    else draftStore()?.removeItem(storageKey(setupId));
  } catch {
    // A full or blocked store only loses the back-button safety net.
  }
}
