import type { Ref } from 'react';
import type { TextInput } from 'react-native';
import { CHANGE_NOTE_MAX } from '../shared/types/setups';
import { TextField } from './TextField';

export type ChangeNoteFieldProps = {
  value: string;
  onChangeText: (text: string) => void;
  required: boolean;
  error?: string | null;
  /** So a blocked save can put the cursor straight into the note. */
  inputRef?: Ref<TextInput>;
};

/** Why this revision exists. Enter adds a line; only the Save button sends. */
export function ChangeNoteField({ value, onChangeText, required, error, inputRef }: ChangeNoteFieldProps) {
  return (
    <TextField
      label={required ? 'Change note (required)' : 'Change note'}
      hint={`What changed and why — it is how you and anyone who forks this will learn from it. ${value.length} of ${CHANGE_NOTE_MAX} characters.`}
      error={error ?? undefined}
      inputRef={inputRef}
      value={value}
      onChangeText={onChangeText}
      multiline
      submitBehavior="newline"
      maxLength={CHANGE_NOTE_MAX}
      placeholder="For example: rear oil 500 → 450, the rear skipped over the braking bumps."
      aria-required={required}
    />
  );
}
