import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignInInput, SignUpInput } from '@shared/schemas/auth';
import { api, setCsrfToken } from '@/lib/api-client';
import type { Me } from './get-me';
import { authKeys } from './keys';

type SessionAnswer = Me & { csrfToken: string };

/** After any sign-in the session is new: keep its token and the person, drop every cached query. */
function useSessionStarted() {
  const qc = useQueryClient();
  return (me: SessionAnswer) => {
    setCsrfToken(me.csrfToken);
    qc.removeQueries();
    qc.setQueryData(authKeys.me(), { user: me.user, studios: me.studios, outbox: me.outbox });
  };
}

export const signIn = (input: SignInInput) => api<SessionAnswer>('/auth/sign-in', { method: 'POST', body: input });
export function useSignIn() {
  const started = useSessionStarted();
  return useMutation({ mutationFn: signIn, onSuccess: started });
}

export const signUp = (input: SignUpInput) => api<SessionAnswer>('/auth/sign-up', { method: 'POST', body: input });
export function useSignUp() {
  const started = useSessionStarted();
  return useMutation({ mutationFn: signUp, onSuccess: started });
}

export const resetPassword = (input: { token: string; password: string }) => api<SessionAnswer>('/auth/reset', { method: 'POST', body: input });
export function useResetPassword() {
  const started = useSessionStarted();
  return useMutation({ mutationFn: resetPassword, onSuccess: started });
}

export const requestReset = (input: { email: string }) => api<{ message: string }>('/auth/reset-request', { method: 'POST', body: input });
export const useRequestReset = () => useMutation({ mutationFn: requestReset });

export const signOut = () => api<void>('/auth/sign-out', { method: 'POST' });
export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      setCsrfToken(null);
      qc.removeQueries();
      qc.setQueryData(authKeys.me(), null);
    },
  });
}
