import { useCallback, useEffect, useReducer, useRef } from 'react';
import { UPLOAD_LIMITS } from '../../../shared/uploads';
import { ApiRequestError } from '../../ui';
import { uploadFile } from '../api/submissions-api';
import { emptyDraft, fileMeta, guessFileMeta, type Draft, type DraftFile, type DriverChoice, type MethodText } from '../logic/draft';

type Action =
  | { type: 'driver'; driver: DriverChoice }
  | { type: 'method'; patch: Partial<MethodText> }
  | { type: 'add'; files: DraftFile[] }
  | { type: 'file'; id: string; patch: Partial<DraftFile> }
  | { type: 'remove'; id: string }
  | { type: 'reset' };

function reducer(state: Draft, a: Action): Draft {
  switch (a.type) {
    case 'driver':
      return { ...state, driver: a.driver };
    case 'method':
      return { ...state, method: { ...state.method, ...a.patch } };
    case 'add':
      return { ...state, files: [...state.files, ...a.files] };
    case 'file':
      return { ...state, files: state.files.map((f) => (f.id === a.id ? { ...f, ...a.patch } : f)) };
    case 'remove':
      return { ...state, files: state.files.filter((f) => f.id !== a.id) };
    case 'reset':
      return emptyDraft();
  }
}

const megabytes = (n: number) => `${(n / 1024 / 1024).toFixed(1)} MB`;

/**
 * The draft submission and the file reading behind it. Every file is read by the server as soon as
 * it is added, and again whenever its kind, angle, level or settings change, so what the preview
 * shows is always what the server understood.
 */
export function useSubmissionDraft() {
  const [draft, dispatch] = useReducer(reducer, undefined, emptyDraft);
  const blobs = useRef(new Map<string, Blob>());
  const inFlight = useRef(new Map<string, string>());
  const nextId = useRef(0);
  const draftRef = useRef(draft);
  draftRef.current = draft;

  const addFiles = useCallback((picked: { name: string; size: number; blob: Blob }[]) => {
    const files: DraftFile[] = picked.map((p) => {
      const id = `file-${++nextId.current}`;
      blobs.current.set(id, p.blob);
      const guess = guessFileMeta(p.name);
      const tooBig = p.size > UPLOAD_LIMITS.fileBytes;
      return {
        id, name: p.name, size: p.size, ...guess, settings: { columns: '', xUnit: 'auto', distortionUnit: 'auto' }, warnings: [], progress: 0,
        status: tooBig ? 'failed' : 'reading',
        ...(tooBig ? { error: { line: null, message: `${p.name}: ${megabytes(p.size)} is over the ${megabytes(UPLOAD_LIMITS.fileBytes)} limit` }, readWith: 'too-big' } : {}),
      };
    });
    dispatch({ type: 'add', files });
  }, []);

  // Reads any file whose description changed since it was last read.
  useEffect(() => {
    for (const f of draft.files) {
      if (f.readWith === 'too-big') continue;
      const m = fileMeta(f);
      if ('error' in m) continue;
      const key = JSON.stringify(m.meta);
      if (f.readWith === key || inFlight.current.get(f.id) === key) continue;
      const blob = blobs.current.get(f.id);
      if (!blob) continue;
      inFlight.current.set(f.id, key);
      dispatch({ type: 'file', id: f.id, patch: { status: 'reading', progress: 0, error: undefined } });
      uploadFile(blob, f.name, m.meta, (progress) => dispatch({ type: 'file', id: f.id, patch: { progress } }))
        .then((r) => {
          if (inFlight.current.get(f.id) !== key) return;
          if (r.ok) {
            dispatch({ type: 'file', id: f.id, patch: { status: 'read', token: r.token, points: r.preview, summary: r.summary, warnings: r.warnings, header: r.settings.headerText, readWith: key, progress: 1 } });
          } else {
            dispatch({ type: 'file', id: f.id, patch: { status: 'failed', token: undefined, points: undefined, error: { line: r.error.line, message: r.error.message }, readWith: key, progress: 1 } });
          }
        })
        .catch((err: unknown) => {
          if (inFlight.current.get(f.id) !== key) return;
          const message = err instanceof ApiRequestError || err instanceof Error ? err.message : 'The file could not be sent';
          dispatch({ type: 'file', id: f.id, patch: { status: 'failed', token: undefined, points: undefined, error: { line: null, message: message.includes(f.name) ? message : `${f.name}: ${message}` }, readWith: key } });
        })
        .finally(() => {
          if (inFlight.current.get(f.id) === key) inFlight.current.delete(f.id);
        });
    }
  }, [draft.files]);

  /** Reads the same file again as other kinds (the H2 and H3 columns of a THD table). */
  const addCopies = useCallback((id: string, copies: Pick<DraftFile, 'kind' | 'level'>[]) => {
    const blob = blobs.current.get(id);
    const source = draftRef.current.files.find((f) => f.id === id);
    if (!blob || !source) return;
    const files: DraftFile[] = copies.map((c) => {
      const copyId = `file-${++nextId.current}`;
      blobs.current.set(copyId, blob);
      return { id: copyId, copyOf: id, name: source.name, size: source.size, kind: c.kind, angle: '', level: c.level, settings: { ...source.settings, columns: '' }, warnings: [], progress: 0, status: 'reading' };
    });
    dispatch({ type: 'add', files });
  }, []);

  return {
    draft,
    addCopies,
    setDriver: useCallback((driver: DriverChoice) => dispatch({ type: 'driver', driver }), []),
    setMethod: useCallback((patch: Partial<MethodText>) => dispatch({ type: 'method', patch }), []),
    addFiles,
    updateFile: useCallback((id: string, patch: Partial<Pick<DraftFile, 'kind' | 'angle' | 'level' | 'settings'>>) => dispatch({ type: 'file', id, patch }), []),
    removeFile: useCallback((id: string) => {
      blobs.current.delete(id);
      inFlight.current.delete(id);
      dispatch({ type: 'remove', id });
    }, []),
    reset: useCallback(() => {
      blobs.current.clear();
      inFlight.current.clear();
      dispatch({ type: 'reset' });
    }, []),
  };
}

export type SubmissionDraft = ReturnType<typeof useSubmissionDraft>;
