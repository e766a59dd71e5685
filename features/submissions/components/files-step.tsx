import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ActionButton, ChoiceToggle, colors, fonts, NumberField, radius, space, TextField } from '../../ui';
import { DISTORTION_KINDS, UPLOAD_LIMITS } from '../../../shared/uploads';
import type { SubmissionDraft } from '../hooks/use-submission-draft';
import { extraHarmonics, fileMeta, kindNeeds, UPLOAD_KINDS, type DraftFile, type FileSettings } from '../logic/draft';

const X_UNITS = [{ value: 'auto', label: 'from the file' }, { value: 'Hz', label: 'Hz' }, { value: 'kHz', label: 'kHz' }, { value: 'mm', label: 'mm' }, { value: 'm', label: 'm' }] as const;
const DIST_UNITS = [{ value: 'auto', label: 'from the file' }, { value: 'percent', label: '%' }, { value: 'db', label: 'dB re fundamental' }] as const;

function ProgressBar({ fraction, failed, testID }: { fraction: number; failed: boolean; testID: string }) {
  const pct = Math.round(Math.max(0, Math.min(1, fraction)) * 100);
  return (
    <View style={styles.track} role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} aria-label="sent" testID={testID}>
      <View style={[styles.fill, { width: `${pct}%` }, failed && styles.fillFailed]} />
    </View>
  );
}

function FileRow({ file, all, draft }: { file: DraftFile; all: readonly DraftFile[]; draft: SubmissionDraft }) {
  const onChange = draft.updateFile;
  const onRemove = () => draft.removeFile(file.id);
  const extra = extraHarmonics(file, all);
  const [open, setOpen] = useState(false);
  const needs = kindNeeds(file.kind);
  const meta = fileMeta(file);
  const t = `submit-file-${file.name.replace(/[^a-zA-Z0-9]+/g, '-')}${file.copyOf ? `-${file.kind}` : ''}`;
  const setSettings = (patch: Partial<FileSettings>) => onChange(file.id, { settings: { ...file.settings, ...patch } });
  const distortion = DISTORTION_KINDS.includes(file.kind);
  return (
    <View style={styles.row} testID={t}>
      <View style={styles.rowHead}>
        <Text style={styles.name} numberOfLines={1}>
          {file.name}
          {file.copyOf ? <Text style={styles.meta}> · {UPLOAD_KINDS.find((k) => k.value === file.kind)?.label} column</Text> : null}
        </Text>
        <Text style={styles.meta}>{(file.size / 1024).toFixed(1)} kB</Text>
        <ActionButton label="Remove" kind="quiet" onPress={onRemove} testID={`${t}-remove`} accessibilityLabel={`Remove ${file.name}`} />
      </View>
      <ProgressBar fraction={file.progress} failed={file.status === 'failed'} testID={`${t}-progress`} />
      <ChoiceToggle
        label={`Kind of curve in ${file.name}`}
        options={UPLOAD_KINDS.map((k) => ({ value: k.value, label: k.label }))}
        value={file.kind}
        onChange={(kind) => onChange(file.id, { kind, angle: file.angle || '0' })}
        testID={`${t}-kind`}
      />
      <View style={styles.inline}>
        {needs === 'angle' ? (
          <View style={styles.short}>
            <NumberField label="Angle" unit="°" value={file.angle} onChangeText={(angle) => onChange(file.id, { angle })} testID={`${t}-angle`} />
          </View>
        ) : null}
        {needs === 'level' ? (
          <View style={styles.short}>
            <NumberField label="Drive level" unit="V" value={file.level} onChangeText={(level) => onChange(file.id, { level })} testID={`${t}-level`} />
          </View>
        ) : null}
        <ActionButton label={open ? 'Hide reading settings' : 'Reading settings'} kind="secondary" onPress={() => setOpen(!open)} testID={`${t}-settings`} />
      </View>
      {open ? (
        <View style={styles.settings}>
          <TextField
            label="Columns"
            value={file.settings.columns}
            onChangeText={(columns) => setSettings({ columns })}
            placeholder="e.g. 1, 2, 3"
            hint="Frequency, value and optional phase, counting from 1. Empty: taken from the header, else the first columns."
            testID={`${t}-columns`}
          />
          <Text style={styles.label}>x unit</Text>
          <ChoiceToggle label="x unit" options={X_UNITS} value={file.settings.xUnit} onChange={(xUnit) => setSettings({ xUnit })} testID={`${t}-xunit`} />
          {distortion ? (
            <>
              <Text style={styles.label}>Distortion given as</Text>
              <ChoiceToggle label="Distortion unit" options={DIST_UNITS} value={file.settings.distortionUnit} onChange={(distortionUnit) => setSettings({ distortionUnit })} testID={`${t}-distunit`} />
            </>
          ) : null}
        </View>
      ) : null}
      {'error' in meta ? <Text style={styles.error}>{meta.error}</Text> : null}
      {file.status === 'reading' ? <Text style={styles.meta}>Reading…</Text> : null}
      {file.status === 'read' && file.summary ? (
        <Text style={styles.ok} testID={`${t}-summary`}>
          Read: {file.summary}
        </Text>
      ) : null}
      {extra.length ? (
        <ActionButton
          label={`Also take ${extra.map((k) => k.toUpperCase()).join(' and ')} from this table`}
          kind="secondary"
          onPress={() => draft.addCopies(file.id, extra.map((kind) => ({ kind, level: file.level })))}
          testID={`${t}-harmonics`}
        />
      ) : null}
      {file.status === 'read' && file.warnings.length > 0 ? file.warnings.map((w) => <Text key={w} style={styles.meta}>• {w}</Text>) : null}
      {file.status === 'failed' && file.error ? (
        <Text style={styles.error} testID={`${t}-error`} accessibilityLiveRegion="polite">
          {file.error.message}
        </Text>
      ) : null}
    </View>
  );
}

const mb = (bytes: number) => bytes / 1024 / 1024;

/** Step 3: the curve files, each read by the server as soon as it is added. */
export function FilesStep({ draft }: { draft: SubmissionDraft }) {
  const [pickError, setPickError] = useState<string | null>(null);
  const choose = async () => {
    setPickError(null);
    try {
      const r = await DocumentPicker.getDocumentAsync({ multiple: true, type: '*/*', copyToCacheDirectory: false });
      if (r.canceled || !r.assets) return;
      const picked: { name: string; size: number; blob: Blob }[] = [];
      for (const a of r.assets) {
        const blob = a.file ?? (await (await fetch(a.uri)).blob());
        picked.push({ name: a.name, size: a.size ?? blob.size, blob });
      }
      draft.addFiles(picked);
    } catch (err) {
      setPickError(err instanceof Error ? err.message : 'The files could not be opened');
    }
  };
  const files = draft.draft.files;
  return (
    <View style={styles.gap} testID="submit-step-files">
      <Text style={styles.meta}>
        Text or CSV exports: frequency and value, optionally phase; any common separator, decimal commas, kHz or Hz, % or dB. Up to {mb(UPLOAD_LIMITS.fileBytes)} MB
        a file and {UPLOAD_LIMITS.curvesPerSubmission} curves a submission; one upload request takes at most {UPLOAD_LIMITS.files} files and{' '}
        {mb(UPLOAD_LIMITS.requestBytes)} MB. Name
        a file like &ldquo;spl-30deg.txt&rdquo; or &ldquo;thd-5.66V.csv&rdquo; and its kind, angle or level is filled in for you.
      </Text>
      <ActionButton label={files.length ? 'Add more files' : 'Choose files'} onPress={choose} testID="submit-choose-files" />
      {pickError ? <Text style={styles.error}>{pickError}</Text> : null}
      {files.map((f) => (
        <FileRow key={f.id} file={f} all={files} draft={draft} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.md },
  row: { borderWidth: 1, borderColor: colors.rule, borderRadius: radius.md, padding: space.md, gap: space.sm, backgroundColor: colors.paper },
  rowHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  name: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink, flexShrink: 1 },
  inline: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.md },
  settings: { gap: space.sm },
  short: { width: 150 },
  label: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  ok: { fontFamily: fonts.regular, fontSize: 13, color: colors.accent },
  error: { fontFamily: fonts.semibold, fontSize: 13, color: colors.warn },
  track: { height: 6, borderRadius: 3, backgroundColor: colors.grid, overflow: 'hidden' },
  fill: { height: 6, backgroundColor: colors.accent },
  fillFailed: { backgroundColor: colors.warn },
});
