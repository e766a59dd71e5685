import { useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { DriverCharts } from '../../drivers';
import { ActionButton, colors, fonts, space } from '../../ui';
import { methodBody, splShiftDb, UPLOAD_KINDS, type Draft } from '../logic/draft';
import { previewSet } from '../logic/preview';

/** Step 5: every curve as the server read it, on the catalogue's own charts, then the send button. */
export function PreviewStep({
  draft, parameterCount, problems, sending, sendError, onSend,
}: {
  draft: Draft;
  parameterCount: number;
  problems: string[];
  sending: boolean;
  sendError: string | null;
  onSend: () => void;
}) {
  const set = useMemo(() => previewSet(draft), [draft]);
  const method = methodBody(draft.method);
  const counts = UPLOAD_KINDS.map((k) => ({ label: k.label, n: set.curves.filter((c) => c.kind === k.value).length })).filter((c) => c.n > 0);
  const driverText = draft.driver.mode === 'existing' ? draft.driver.label : `${draft.driver.makerName} ${draft.driver.model} (new entry)`;
  return (
    <View style={styles.gap} testID="submit-step-preview">
      <View style={styles.summary} testID="submit-summary">
        <Text style={styles.line}>Driver: {driverText || '—'}</Text>
        <Text style={styles.line}>
          Method:{' '}
          {method.ok
            ? `${method.value.driveVoltageV} V at ${method.value.distanceM} m, ${method.value.baffle}; SPL shifted ${splShiftDb(method.value.driveVoltageV, method.value.distanceM).toFixed(2)} dB to 2.83 V / 1 m`
            : 'incomplete'}
        </Text>
        <Text style={styles.line} testID="submit-curve-count">
          Curves: {counts.length ? counts.map((c) => `${c.n} ${c.label}`).join(', ') : 'none read yet'}
        </Text>
        <Text style={styles.line}>Parameters: {parameterCount}</Text>
      </View>
      <DriverCharts set={set} sets={[set]} />
      {problems.length ? (
        <View style={styles.problems} testID="submit-problems">
          <Text style={styles.warnTitle}>Before sending</Text>
          {problems.map((p) => (
            <Text key={p} style={styles.problem}>
              • {p}
            </Text>
          ))}
        </View>
      ) : (
        <Text style={styles.meta}>Nothing is listed until a moderator approves it. The original files are kept with the submission.</Text>
      )}
      {sendError ? (
        <Text style={styles.problem} testID="submit-send-error">
          {sendError}
        </Text>
      ) : null}
      <ActionButton label={sending ? 'Sending…' : 'Send for review'} onPress={onSend} disabled={sending || problems.length > 0} testID="submit-send" />
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.md },
  summary: { gap: 2 },
  line: { fontFamily: fonts.regular, fontSize: 14, color: colors.ink },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  problems: { borderLeftWidth: 3, borderLeftColor: colors.warn, paddingLeft: space.sm, gap: 2 },
  warnTitle: { fontFamily: fonts.semibold, fontSize: 14, color: colors.warn },
  problem: { fontFamily: fonts.regular, fontSize: 13, color: colors.warn },
});
