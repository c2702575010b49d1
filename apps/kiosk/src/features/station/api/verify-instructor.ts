import { stationInstructorResultSchema } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

export function verifyInstructor(input: { badge: string; pin: string }) {
  return apiPost('/station/instructor', input, stationInstructorResultSchema);
}

export function useVerifyInstructor() {
  return useMutation({ mutationFn: verifyInstructor });
}
