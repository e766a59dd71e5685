import { Link } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { mutate } from 'swr';
import { RequireRole } from '../../account';
import { useDriver } from '../../drivers';
import { useNumberFields, useParameterFields, type FieldSpec } from '../../tools';
import { ActionButton, ApiRequestError, Card, colors, fonts, ScreenFrame, space, useBreakpoint } from '../../ui';
import { sendSubmission } from '../api/submissions-api';
import { DriverStep } from '../components/driver-step';
import { FilesStep } from '../components/files-step';
import { MethodStep } from '../components/method-step';
import { MySubmissions } from '../components/my-submissions';
import { ParametersStep } from '../components/parameters-step';
import { PreviewStep } from '../components/preview-step';
import { StepBar } from '../components/step-bar';
import { MY_SUBMISSIONS_PATH } from '../hooks/use-my-submissions';
import { useSubmissionDraft } from '../hooks/use-submission-draft';
import { LARGE_FIELDS, type LargeKey } from '../logic/large-signal-from-files';
import { buildSubmission, driverBody, fileProblems, methodBody, type ParameterValues } from '../logic/draft';

interface Sent {
  driverSlug: string;
  label: string;
  /** Added to a driver already in the catalogue, whose page can be opened now. */
  listed: boolean;
}

const STEPS = ['Driver', 'Method', 'Files', 'Parameters', 'Check and send'] as const;
const largeSpec = Object.fromEntries(LARGE_FIELDS.map((f) => [f.key, { unit: f.unit }])) as FieldSpec<LargeKey>;

/** The small-signal values as stored: air temperature is not a driver parameter, a diameter becomes Sd. */
function storedSmall(values: Partial<Record<string, number>>): ParameterValues {
  const { temperatureC: _t, diameter, ...rest } = values;
  if (diameter !== undefined && rest.sd === undefined) rest.sd = (Math.PI * diameter * diameter) / 4;
  return rest;
}

function SubmitForm({ onSent, driverSlug }: { onSent: (sent: Sent) => void; driverSlug?: string }) {
  const [step, setStep] = useState(0);
  const d = useSubmissionDraft();
  // Arriving from a driver's page: that driver is picked once its name is known.
  const linked = useDriver(driverSlug && /^[a-z0-9-]{1,160}$/.test(driverSlug) ? driverSlug : undefined);
  const linkedData = linked.data;
  const setDriver = d.setDriver;
  useEffect(() => {
    if (linkedData) setDriver({ mode: 'existing', slug: linkedData.slug, label: `${linkedData.maker.name} ${linkedData.model}` });
  }, [linkedData, setDriver]);
  const small = useParameterFields();
  const large = useNumberFields(largeSpec);
  const [sending, setSending] = useState(false);
  const [sendError, setSendError] = useState<string | null>(null);

  const driver = driverBody(d.draft.driver);
  const method = methodBody(d.draft.method);
  const filesWrong = fileProblems(d.draft.files);
  const paramErrors = [...Object.entries(small.localErrors), ...Object.entries(large.localErrors)].map(([k, m]) => `${k}: ${m}`);
  const smallValues = storedSmall(small.values);
  const built = buildSubmission(d.draft, smallValues, large.values);
  const problems = built.ok ? paramErrors : [...built.problems, ...paramErrors];
  const stepProblems = [driver.ok ? [] : driver.problems, method.ok ? [] : method.problems, filesWrong, paramErrors, []][step];
  const complete = [driver.ok, method.ok, filesWrong.length === 0, paramErrors.length === 0 && Object.keys(smallValues).length + Object.keys(large.values).length > 0, false];

  const send = async () => {
    if (!built.ok || paramErrors.length) return;
    setSending(true);
    setSendError(null);
    try {
      const r = await sendSubmission(built.body);
      await mutate(MY_SUBMISSIONS_PATH);
      const label = d.draft.driver.mode === 'existing' ? d.draft.driver.label : `${d.draft.driver.makerName.trim()} ${d.draft.driver.model.trim()}`;
      onSent({ driverSlug: r?.driverSlug ?? '', label, listed: d.draft.driver.mode === 'existing' });
    } catch (err) {
      const fields = err instanceof ApiRequestError ? (err.details as { fields?: { field: string; message: string }[] } | undefined)?.fields : undefined;
      const where = fields?.map((f) => {
        const m = /^uploads\.(\d+)$/.exec(f.field);
        return m ? `${d.draft.files[Number(m[1])]?.name ?? f.field}: ${f.message}` : `${f.field}: ${f.message}`;
      });
      setSendError(`${err instanceof Error ? err.message : 'The submission failed'}${where?.length ? ` (${where.join('; ')})` : ''}`);
    } finally {
      setSending(false);
    }
  };

  return (
    <View style={styles.gap}>
      <StepBar steps={STEPS.map((label, i) => ({ label, complete: complete[i] }))} current={step} onPick={setStep} />
      <Card>
        <Text style={styles.h2} accessibilityRole="header">
          {step + 1}. {STEPS[step]}
        </Text>
        {step === 0 ? <DriverStep value={d.draft.driver} onChange={d.setDriver} /> : null}
        {step === 1 ? <MethodStep value={d.draft.method} onChange={d.setMethod} /> : null}
        {/* Kept mounted so a file being read keeps its row while the reviewer moves on. */}
        <View style={step === 2 ? null : styles.hidden}>
          <FilesStep draft={d} />
        </View>
        <View style={step === 3 ? null : styles.hidden}>
          <ParametersStep small={small} large={large} files={d.draft.files} />
        </View>
        {step === 4 ? (
          <PreviewStep draft={d.draft} parameterCount={Object.keys(smallValues).length + Object.keys(large.values).length} problems={problems} sending={sending} sendError={sendError} onSend={send} />
        ) : null}
        {stepProblems.length && step < 4 ? (
          <View style={styles.todo} testID="submit-step-todo">
            {stepProblems.map((p) => (
              <Text key={p} style={styles.todoText}>
                • {p}
              </Text>
            ))}
          </View>
        ) : null}
        <View style={styles.nav}>
          {step > 0 ? <ActionButton label="Back" kind="secondary" onPress={() => setStep(step - 1)} testID="submit-back" /> : null}
          {step < STEPS.length - 1 ? <ActionButton label={`Next: ${STEPS[step + 1]}`} onPress={() => setStep(step + 1)} testID="submit-next" /> : null}
        </View>
      </Card>
    </View>
  );
}

/** The reviewer's desk: a new submission in five steps, and the state of earlier ones. */
export function SubmitScreen({ driverSlug }: { driverSlug?: string } = {}) {
  const wide = useBreakpoint() === 'wide';
  const [formKey, setFormKey] = useState(0);
  const [sent, setSent] = useState<Sent | null>(null);
  return (
    <ScreenFrame testID="submit-screen">
      <Text style={styles.h1} accessibilityRole="header">
        Submit measurements
      </Text>
      <RequireRole role="reviewer">
        <View style={wide ? styles.split : styles.gap}>
          <View style={wide ? styles.main : null}>
            {sent ? (
              <Card testID="submit-sent">
                <Text style={styles.h2}>Sent for review</Text>
                <Text style={styles.body}>
                  Your measurements of {sent.label} are awaiting a moderator&apos;s approval; they appear on the driver&apos;s page once approved.{' '}
                  {sent.listed ? (
                    <Link href={`/drivers/${sent.driverSlug}`} style={styles.link}>
                      Open the listed entry
                    </Link>
                  ) : null}
                </Text>
                <ActionButton
                  label="Start another submission"
                  kind="secondary"
                  onPress={() => {
                    setSent(null);
                    setFormKey((k) => k + 1);
                  }}
                  testID="submit-another"
                />
              </Card>
            ) : (
              <SubmitForm key={formKey} onSent={setSent} driverSlug={formKey === 0 ? driverSlug : undefined} />
            )}
          </View>
          <View style={wide ? styles.side : null}>
            <MySubmissions />
          </View>
        </View>
      </RequireRole>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  h2: { fontFamily: fonts.semibold, fontSize: 18, color: colors.ink },
  body: { fontFamily: fonts.regular, fontSize: 15, color: colors.ink },
  link: { fontFamily: fonts.semibold, color: colors.accent },
  gap: { gap: space.md },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  main: { flex: 2, minWidth: 0 },
  side: { flex: 1, minWidth: 260 },
  hidden: { display: 'none' },
  nav: { flexDirection: 'row', justifyContent: 'flex-end', gap: space.sm, marginTop: space.sm },
  todo: { borderLeftWidth: 3, borderLeftColor: colors.gridStrong, paddingLeft: space.sm, gap: 2 },
  todoText: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
});
