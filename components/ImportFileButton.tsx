import { createElement, useRef } from 'react';
import { Platform } from 'react-native';
import { AppText } from './AppText';
import { Button } from './Button';

export type ImportFileButtonProps = {
  label: string;
  /** File types the browser's picker offers, e.g. "application/json,.json". */
  accept: string;
  onPick: (file: File) => void;
  disabled?: boolean;
  busy?: boolean;
  busyLabel?: string;
};

/**
 * Picks one file from the device. On web a hidden file input does the picking and our own button
 * opens it, so the control looks like the rest of the app and keeps its accessible name.
 */
export function ImportFileButton({ label, accept, onPick, disabled, busy, busyLabel }: ImportFileButtonProps) {
  const input = useRef<HTMLInputElement | null>(null);
  if (Platform.OS !== 'web') {
    return <AppText tone="muted">Choosing files works in the web app for now.</AppText>;
  }
  return (
    <>
      {createElement('input', {
        ref: input,
        type: 'file',
        accept,
        hidden: true,
        tabIndex: -1,
        'aria-hidden': true,
        onChange: (e: { currentTarget: HTMLInputElement }) => {
          const file = e.currentTarget.files?.[0];
          // Clearing lets the same file be picked again after a failed attempt.
          e.currentTarget.value = '';
          if (file) onPick(file);
        },
      })}
      <Button label={label} variant="secondary" disabled={disabled} busy={busy} busyLabel={busyLabel} onPress={() => input.current?.click()} />
    </>
  );
}
