import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import type { SavedMapping } from '@/shared/api/receptions';

import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { space } from '../ui/theme';

export type SavedMappingsProps = {
  saved: SavedMapping[];
  saving: boolean;
  error?: string;
  onUse: (saved: SavedMapping) => void;
  onSave: (name: string) => Promise<unknown>;
};

/** Reuse a mapping saved earlier, or keep this one under a name. */
export function SavedMappings({ saved, saving, error, onUse, onSave }: SavedMappingsProps) {
  const [name, setName] = useState('');
  const [nameError, setNameError] = useState<string | undefined>();
  return (
    <View style={styles.root}>
      {saved.length ? (
        <View style={styles.row}>
          <Text variant="label">Use a saved mapping:</Text>
          {saved.map((m) => (
            <Button
              key={m.id}
              label={m.name}
              accessibilityLabel={`${m.name}: use this saved mapping`}
              variant="secondary"
              onPress={() => onUse(m)}
            />
          ))}
        </View>
      ) : null}
      <View style={styles.row}>
        <TextField
          label="Save this mapping as"
          value={name}
          onChangeText={setName}
          placeholder="My receiver's export"
          error={nameError ?? error}
          style={styles.field}
        />
        <Button
          label="Save mapping"
          variant="secondary"
          busy={saving}
          style={styles.save}
          onPress={async () => {
            if (!name.trim()) return setNameError('Give the mapping a name');
            setNameError(undefined);
            try {
              await onSave(name.trim());
              setName('');
            } catch {
              /* the error prop shows the server's message */
            }
          }}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.sm },
  field: { flexGrow: 1, flexBasis: 200 },
  save: { marginBottom: 22 },
});
