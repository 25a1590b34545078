import { useCallback, useState } from 'react';
import { Platform } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import { useMeQuery } from './auth';
import { useUploadSetupPhoto } from './setups';

/** What signed-out readers see: the units the sheets are stored in. */
export const STORED_UNITS: UnitPreferences = { length: 'mm', temperature: 'C' };

/** The signed-in racer's display units, or the stored units for anyone else. */
export function useDisplayUnits(): UnitPreferences {
  return useMeQuery().data?.units ?? STORED_UNITS;
}

/**
 * A photo upload with its progress kept in state, so the page can draw a bar while the request is
 * out. Progress resets when a new upload starts; the mutation keeps the server's error.
 */
export function usePhotoUpload(setupId: number) {
  const upload = useUploadSetupPhoto(setupId);
  const [progress, setProgress] = useState<number | null>(null);
  const start = useCallback(
    (file: Blob, caption?: string) => {
      setProgress(0);
      upload.mutate(
        { file, caption, onProgress: setProgress },
        { onSettled: () => setProgress(null) },
      );
    },
    [upload],
  );
  return { start, progress: upload.isPending ? (progress ?? 0) : null, error: upload.error, reset: upload.reset, isSuccess: upload.isSuccess };
}

/** The address someone else opens to read an unlisted setup. */
export function shareLinkFor(setupId: number, shareToken: string): string {
  const origin = Platform.OS === 'web' && typeof window !== 'undefined' ? window.location.origin : '';
  return `${origin}/setups/${setupId}?share=${encodeURIComponent(shareToken)}`;
}

/** Copies text where the platform lets a page do that; resolves false where it cannot. */
export async function copyText(text: string): Promise<boolean> {
  if (Platform.OS !== 'web' || typeof navigator === 'undefined' || !navigator.clipboard) return false;
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    // Blocked by the browser (no permission, page not focused): the link stays on screen to copy by hand.
    return false;
  }
}
