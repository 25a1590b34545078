import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { FormErrorBanner } from './FormErrorBanner';
import { ImportFileButton } from './ImportFileButton';
import { PhotoUploadProgress } from './PhotoUploadProgress';
import { StatusNote } from './StatusNote';
import { TextField } from './TextField';

export type PhotoUploaderProps = {
  onPick: (file: File, caption: string) => void;
  /** 0–1 while an upload is out, null otherwise. */
  progress: number | null;
  /** The server's words when it refused the photo. */
  error: string | null;
  done: boolean;
};

/** The owner's way to add a photo: an optional caption, then a file; the upload starts on picking. */
export function PhotoUploader({ onPick, progress, error, done }: PhotoUploaderProps) {
  const [caption, setCaption] = useState('');
  const uploading = progress !== null;
  // The caption belongs to the photo that went up; after a refusal it stays for the next try.
  useEffect(() => {
    if (done) setCaption('');
  }, [done]);
  return (
    <View style={styles.group}>
      <TextField
        label="Caption (optional)"
        hint="Say what the photo shows, such as the shock shims or the wing angle."
        value={caption}
        onChangeText={setCaption}
        maxLength={200}
        editable={!uploading}
      />
      <ImportFileButton
        label="Add a photo"
        accept="image/jpeg,image/png,image/webp,image/avif"
        disabled={uploading}
        onPick={(file) => onPick(file, caption.trim())}
      />
      {uploading ? <PhotoUploadProgress fraction={progress} /> : null}
      <FormErrorBanner message={error} />
      <StatusNote message={done && !uploading && !error ? 'Photo added.' : null} />
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
});
