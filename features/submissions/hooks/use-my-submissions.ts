import useSWR from 'swr';
import type { MySubmission } from '../../../shared/schemas/submissions';

export const MY_SUBMISSIONS_PATH = '/api/submissions/mine';

export function useMySubmissions() {
  return useSWR<{ submissions: MySubmission[] }>(MY_SUBMISSIONS_PATH);
}
