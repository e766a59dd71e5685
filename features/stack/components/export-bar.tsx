import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { exportChartsPng, type PngExport } from '../../charts';
import { ActionButton, colors, fonts, space } from '../../ui';

/** Hands the bytes to the browser as a download, through an object URL (data URLs can be refused). */
function download(filename: string, blob: Blob) {
  const href = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = href;
  a.download = filename;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(href), 10_000);
}

function base64Bytes(b64: string): Uint8Array<ArrayBuffer> {
  const bin = atob(b64);
  const out = new Uint8Array(bin.length);
  for (let i = 0; i < bin.length; i++) out[i] = bin.charCodeAt(i);
  return out;
}

export function ExportBar({ png, csv }: { png: () => PngExport; csv: () => string }) {
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const onPng = async () => {
    setBusy(true);
    setError(null);
    try {
      download('conestack-stack.png', new Blob([base64Bytes(await exportChartsPng(png()))], { type: 'image/png' }));
    } catch (e) {
      setError(`Could not draw the image: ${(e as Error).message}`);
    } finally {
      setBusy(false);
    }
  };
  const onCsv = () => download('conestack-stack.csv', new Blob([csv()], { type: 'text/csv;charset=utf-8' }));
  return (
    <View style={styles.row}>
      <ActionButton kind="secondary" label={busy ? 'Drawing…' : 'Download PNG'} onPress={onPng} disabled={busy} testID="export-png" />
      <ActionButton kind="secondary" label="Download CSV" onPress={onCsv} testID="export-csv" />
      {error ? <Text style={styles.error} testID="export-error">{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap', alignItems: 'center' },
  error: { fontFamily: fonts.regular, fontSize: 12, color: colors.warn },
});
