import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { NotesEditorPreview, type NotesPreviewState } from './NotesEditorPreview';
import { TextField } from './TextField';

// The same limit as the server's notes schema (shared/types/setups.ts).
export const NOTES_MAX_LENGTH = 20_000;

export type NotesEditorProps = {
  value: string;
  onChangeText: (text: string) => void;
  /** What is wrong with the notes; shown under the field. */
  error?: string;
  disabled?: boolean;
  preview: NotesPreviewState;
  /** Asks the server to render `markdown`; the answer comes back through `preview`. */
  onPreview: (markdown: string) => void;
};

type Tab = 'write' | 'preview';
const TABS: { value: Tab; label: string }[] = [
  { value: 'write', label: 'Write' },
  { value: 'preview', label: 'Preview' },
];

const count = (n: number) => n.toLocaleString('en-GB');

/** Notes in markdown with a Write / Preview switch and a count against the limit. */
export function NotesEditor({ value, onChangeText, error, disabled, preview, onPreview }: NotesEditorProps) {
  const { colors } = useTheme();
  const [tab, setTab] = useState<Tab>('write');
  const over = value.length > NOTES_MAX_LENGTH;

  const choose = (next: Tab) => {
    setTab(next);
    // Ask again only when the words changed since the last preview, or the last try failed.
    const stale = preview.markdown !== value || preview.error !== null;
    if (next === 'preview' && value.trim() !== '' && stale && !preview.pending) onPreview(value);
  };

  return (
    <View style={styles.group}>
      <View role="tablist" aria-label="Write or preview the notes" style={styles.tabs}>
        {TABS.map((t) => {
          const on = tab === t.value;
          return (
            <Pressable
              key={t.value}
              role="tab"
              aria-selected={on}
              aria-label={`${t.label} notes`}
              onPress={() => choose(t.value)}
              style={[styles.tab, { borderColor: on ? colors.accent : colors.border, backgroundColor: on ? colors.accentSoft : colors.surface }]}
            >
              <AppText style={{ fontWeight: on ? '700' : '400' }}>{t.label}</AppText>
            </Pressable>
          );
        })}
      </View>
      {tab === 'write' ? (
        <TextField
          label="Notes"
          hint="Markdown works: **bold**, *italic*, - lists, [links](https://…)."
          value={value}
          onChangeText={onChangeText}
          error={error}
          multiline
          editable={!disabled}
        />
      ) : (
        <NotesEditorPreview markdown={value} preview={preview} onRetry={() => onPreview(value)} />
      )}
      <AppText variant="caption" tone={over ? 'danger' : 'muted'}>
        {count(value.length)} of {count(NOTES_MAX_LENGTH)} characters{over ? ` — ${count(value.length - NOTES_MAX_LENGTH)} too many` : ''}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  tabs: { flexDirection: 'row', gap: space.sm },
  tab: {
    minHeight: layout.minTouchTarget,
    minWidth: layout.minTouchTarget,
    paddingHorizontal: space.lg,
    borderRadius: radius.pill,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
