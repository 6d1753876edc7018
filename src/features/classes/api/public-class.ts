import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CheckoutStartedDto,
  MyClassesDto,
  PublicClassDto,
  RegisterInput,
  RegistrationCancelledDto,
  RegistrationCreatedDto,
  RegistrationDto,
} from '@shared/schemas/class';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

/** The public page of a class (no account needed). */
export const getPublicClass = (studioSlug: string, id: string) => api<PublicClassDto>(`/public/classes/${encodeURIComponent(studioSlug)}/${id}`);
export const publicClassQueryOptions = (studioSlug: string, id: string) =>
  queryOptions({ queryKey: classKeys.public(studioSlug, id), queryFn: () => getPublicClass(studioSlug, id), retry: false });
export const usePublicClass = (studioSlug: string, id: string) => useQuery(publicClassQueryOptions(studioSlug, id));

/** Registers: a seat to pay for (with the checkout address), a confirmed free seat, or the waiting list. */
export function useRegister(studioSlug: string, id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: RegisterInput) => api<RegistrationCreatedDto>(`/classes/${id}/registrations`, { method: 'POST', body: input }),
    onSettled: () => qc.invalidateQueries({ queryKey: classKeys.public(studioSlug, id) }),
  });
}

/** An attendee's own registration, by the link in their e-mail. */
export const getRegistration = (id: string, token: string) => api<RegistrationDto>(`/registrations/${id}?token=${encodeURIComponent(token)}`);
export const registrationQueryOptions = (id: string, token: string) =>
  queryOptions({ queryKey: classKeys.registration(id), queryFn: () => getRegistration(id, token), retry: false });
export const useRegistration = (id: string, token: string) => useQuery(registrationQueryOptions(id, token));

/** Pay for a held seat: the checkout address to go to (null when it is paid already). */
export function useCheckout(id: string, token: string) {
  return useMutation({ mutationFn: () => api<CheckoutStartedDto>(`/registrations/${id}/checkout`, { method: 'POST', body: { token } }) });
}

/** The attendee gives their seat back (refunded until the deadline). */
export function useCancelOwn(id: string, token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<RegistrationCancelledDto>(`/registrations/${id}/cancel`, { method: 'POST', body: { token } }),
    onSettled: () => qc.invalidateQueries({ queryKey: classKeys.registration(id) }),
  });
}

/** The signed-in person's classes (the student's view). */
export const getMyClasses = () => api<MyClassesDto>('/my/classes');
export const myClassesQueryOptions = () => queryOptions({ queryKey: classKeys.mine(), queryFn: getMyClasses });
export const useMyClasses = () => useQuery(myClassesQueryOptions());
