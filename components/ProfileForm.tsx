import { StyleSheet, View } from 'react-native';
import { useForm } from '../hooks/form';
import { profileUpdateSchema, type Me, type ProfileUpdate } from '../shared/types/auth';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../shared/types/vehicleClasses';
import { space } from '../theme';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';
import { FormErrorBanner } from './FormErrorBanner';
import { StatusNote } from './StatusNote';
import { TextField } from './TextField';

export type ProfileFormProps = {
  me: Me;
  onSubmit: (values: ProfileUpdate) => unknown;
  pending: boolean;
  error: unknown;
  /** Shown after the last save went through. */
  savedMessage?: string | null;
};

const CLASS_OPTIONS = VEHICLE_CLASSES.map((c) => ({ value: c.key, label: c.label }));

type Values = { displayName: string; bio: string; homeTrack: string; classesRaced: VehicleClassKey[] };

/** What other racers see on your public page. */
export function ProfileForm({ me, onSubmit, pending, error, savedMessage }: ProfileFormProps) {
  const initial: Values = { displayName: me.displayName, bio: me.bio, homeTrack: me.homeTrack, classesRaced: me.classesRaced };
  const form = useForm({ initial, schema: profileUpdateSchema, onSubmit, serverError: error, pending });
  const submit = () => void form.submit();
  return (
    <View style={styles.form}>
      <FormErrorBanner message={form.formError} />
      <TextField
        label="Display name"
        value={form.values.displayName}
        onChangeText={(text) => form.setField('displayName', text)}
        error={form.fieldErrors.displayName}
        autoComplete="nickname"
        textContentType="nickname"
        onSubmitEditing={submit}
      />
      <TextField
        label="Bio"
        hint="Markdown works here: **bold**, _italic_, [a link](https://example.com) and lists starting with -."
        value={form.values.bio}
        onChangeText={(text) => form.setField('bio', text)}
        error={form.fieldErrors.bio}
        multiline
      />
      <TextField
        label="Home track"
        hint="Where you race most weekends."
        value={form.values.homeTrack}
        onChangeText={(text) => form.setField('homeTrack', text)}
        error={form.fieldErrors.homeTrack}
        onSubmitEditing={submit}
      />
      <ChoiceChips
        label="Classes you race"
        multiple
        options={CLASS_OPTIONS}
        selected={form.values.classesRaced}
        onChange={(classes) => form.setField('classesRaced', classes)}
        error={form.fieldErrors.classesRaced}
      />
      <StatusNote message={savedMessage} />
      <Button label="Save profile" busyLabel="Saving…" busy={pending} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
