import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChangePasswordInput, MeDto, ResetInput, ResetRequestedDto, ResetRequestInput, SignedInDto, SignInInput, SignUpInput } from '@shared/schemas/auth';
import { api, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

/** After any sign-in the session is new: keep its token and the person, drop every cached query. */
function useSessionStarted() {
  const qc = useQueryClient();
  return (me: SignedInDto) => {
    setCsrfToken(me.csrfToken);
    qc.removeQueries();
    qc.setQueryData<MeDto>(authKeys.me(), { user: me.user, studios: me.studios, outbox: me.outbox, devMailbox: me.devMailbox });
  };
}

export const signIn = (input: SignInInput) => api<SignedInDto>('/auth/sign-in', { method: 'POST', body: input });
export function useSignIn() {
  const started = useSessionStarted();
  return useMutation({ mutationFn: signIn, onSuccess: started });
}

export const signUp = (input: SignUpInput) => api<SignedInDto>('/auth/sign-up', { method: 'POST', body: input });
export function useSignUp() {
  const started = useSessionStarted();
  return useMutation({ mutationFn: signUp, onSuccess: started });
}

export const resetPassword = (input: ResetInput) => api<SignedInDto>('/auth/reset', { method: 'POST', body: input });
export function useResetPassword() {
  const started = useSessionStarted();
  return useMutation({ mutationFn: resetPassword, onSuccess: started });
}

export const changePassword = (input: ChangePasswordInput) => api<SignedInDto>('/auth/password', { method: 'POST', body: input });
/** The password changes and the session is a new one: keep its token and the person (the cached reads stay true). */
export function useChangePassword() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: changePassword,
    onSuccess: (me) => {
      setCsrfToken(me.csrfToken);
      qc.setQueryData<MeDto>(authKeys.me(), { user: me.user, studios: me.studios, outbox: me.outbox, devMailbox: me.devMailbox });
    },
  });
}

export const requestReset = (input: ResetRequestInput) => api<ResetRequestedDto>('/auth/reset-request', { method: 'POST', body: input });
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
