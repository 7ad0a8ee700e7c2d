import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ImportProgress, ProgressBar } from './import-progress';
import { MappingEditor } from './mapping-editor';
import { pickReportsFile } from './pick-file';
import { PreviewRows } from './preview-rows';
import {
  useImportStatusQuery,
  usePreviewImportMutation,
  useSavedMappingsQuery,
  useSaveMappingMutation,
  useStartImportMutation,
} from './queries';
import { formatBytes } from './sample';
import { SavedMappings } from './saved-mappings';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { LoadingState } from '../ui/query-states';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';
import type { ImportMapping } from '@/shared/api/receptions';
import { Heading } from '../ui/heading';
import { ScreenTitle } from '../ui/screen-title';

/** The whole import screen: pick a file, map its columns, watch the import (loaded on first use by the route). */
export function ImportReportsScreen() {
  const router = useRouter();
  const { job } = useLocalSearchParams<{ job?: string }>();
  const jobId = job ? Number(job) : null;
  const [file, setFile] = useState<File | null>(null);
  const [mapping, setMapping] = useState<ImportMapping | null>(null);
  const [upload, setUpload] = useState<{ sentBytes: number; totalBytes: number } | null>(null);
  const preview = usePreviewImportMutation();
  const saved = useSavedMappingsQuery();
  const saveMapping = useSaveMappingMutation();
  const start = useStartImportMutation(setUpload);
  const status = useImportStatusQuery(jobId);

  const readAgain = (chosen: File, next?: ImportMapping) =>
    preview.mutate({ file: chosen, mapping: next }, { onSuccess: (answer) => setMapping(answer.mapping) });

  const choose = async () => {
    const picked = await pickReportsFile();
    if (!picked) return;
    setFile(picked);
    setMapping(null);
    router.setParams({ job: undefined });
    readAgain(picked);
  };

  const changed = !!mapping && !!preview.data && JSON.stringify(mapping) !== JSON.stringify(preview.data.mapping);

  return (
    <Screen>
      <Stack.Screen options={{ title: 'Import reports · Faintline' }} />
      <View style={styles.heading}>
        <ScreenTitle>Import a file of reports</ScreenTitle>
        <Text tone="muted">
          A CSV or TSV file of decodes in any column order (up to 200 MB). Faintline proposes how to read each column and shows the first
          rows before anything is stored. A report counts once, however often it arrives.
        </Text>
      </View>
      <View style={styles.row}>
        <Button label={file ? 'Choose another file' : 'Choose a file'} onPress={choose} />
        {file ? (
          <Text tone="muted">
            {file.name} · {formatBytes(file.size)}
          </Text>
        ) : null}
      </View>
      {preview.isError ? <Notice message={preview.error.message} /> : null}
      {preview.isPending ? <LoadingState label="Reading the first rows…" /> : null}
      {file && mapping && preview.data && !jobId && !start.isPending ? (
        <>
          <Card>
            <Heading level={2}>How the columns are read</Heading>
            {preview.data.notes.map((note) => (
              <Notice key={note} tone="info" message={note} />
            ))}
            <MappingEditor mapping={mapping} samples={preview.data.rows} onChange={setMapping} />
            <View style={styles.row}>
              <Button
                label="Read again with these settings"
                variant={changed ? 'primary' : 'secondary'}
                onPress={() => readAgain(file, mapping)}
              />
              {changed ? <Text tone="signal">Changed: read again to check the rows.</Text> : null}
            </View>
            <SavedMappings
              saved={saved.data ?? []}
              saving={saveMapping.isPending}
              error={saveMapping.error?.message}
              onUse={(m) => readAgain(file, m.mapping)}
              onSave={(name) => saveMapping.mutateAsync({ name, mapping })}
            />
          </Card>
          <Card>
            <Heading level={2}>The first rows as they will be read</Heading>
            <PreviewRows preview={preview.data} />
          </Card>
          {start.isError ? <Notice message={start.error.message} /> : null}
          <Button
            label="Start the import"
            disabled={changed}
            accessibilityHint={changed ? 'Read the file again with the changed settings first' : undefined}
            onPress={() =>
              start.mutate(
                { file, mapping },
                { onSuccess: ({ id }) => router.setParams({ job: String(id) }), onSettled: () => setUpload(null) },
              )
            }
          />
        </>
      ) : null}
      {start.isPending ? (
        <Card>
          <Text variant="heading">Sending {file?.name}</Text>
          <ProgressBar label="Upload" fraction={upload && upload.totalBytes ? upload.sentBytes / upload.totalBytes : 0} />
          <Text variant="caption" tone="muted">
            {upload ? `${formatBytes(upload.sentBytes)} of ${formatBytes(upload.totalBytes)} sent` : 'Starting…'}
          </Text>
        </Card>
      ) : null}
      {jobId ? (
        status.data ? (
          <>
            <ImportProgress job={status.data} />
            <Text variant="caption" tone="muted">
              The import runs on the server: you may leave this page; your recent imports show how it went.
            </Text>
          </>
        ) : status.isError ? (
          <Notice message={status.error.message} />
        ) : (
          <LoadingState label="Asking how the import goes…" />
        )
      ) : null}
      <TextLink href="/receivers" label="Listening posts and recent imports" />
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
});
