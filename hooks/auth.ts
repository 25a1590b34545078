import { hashKey, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { Linking, Platform } from 'react-native';
import {
  authResultSchema,
  meResponseSchema,
  messageResponseSchema,
  type Me,
  type SignInRequest,
  type SignUpRequest,
} from '../shared/types/auth';
import { apiMutate, apiRequest, apiUrl, rememberCsrfToken } from './api';
import { STALE } from './queryClient';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};

/** The signed-in racer, or null when nobody is signed in. */
export function useMeQuery() {
  return useQuery({
    queryKey: authKeys.me(),
    queryFn: async ({ signal }): Promise<Me | null> => (await apiRequest('/me', { schema: meResponseSchema, signal })).user,
    staleTime: STALE.session,
  });
}

/**
 * Everything cached belonged to the old session, so it all goes. The signed-in answer is
 * overwritten with null rather than removed: screens already showing it are subscribed to that
 * very entry, and removing it would leave them showing the racer who just left.
 */
export function forgetSession(queryClient: QueryClient): void {
  rememberCsrfToken(null);
  void queryClient.cancelQueries();
  queryClient.setQueryData<Me | null>(authKeys.me(), null);
  const meHash = hashKey(authKeys.me());
  queryClient.removeQueries({ predicate: (query) => query.queryHash !== meHash });
}

function useStartSession() {
  const queryClient = useQueryClient();
  return (result: { user: Me; csrfToken: string }) => {
    rememberCsrfToken(result.csrfToken);
    queryClient.setQueryData<Me | null>(authKeys.me(), result.user);
  };
}

export function useSignIn() {
  const startSession = useStartSession();
  return useMutation({
    mutationFn: (body: SignInRequest) => apiMutate('/auth/sign-in', { body, schema: authResultSchema }),
    onSuccess: startSession,
  });
}

export function useSignUp() {
  const startSession = useStartSession();
  return useMutation({
    mutationFn: (body: SignUpRequest) => apiMutate('/auth/sign-up', { body, schema: authResultSchema }),
    onSuccess: startSession,
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiMutate('/auth/sign-out'),
    onSuccess: () => forgetSession(queryClient),
  });
}

/** Ends every session of this racer, this one included. */
export function useSignOutEverywhere() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiMutate('/me/sign-out-everywhere'),
    onSuccess: () => forgetSession(queryClient),
  });
}

export function useVerifyEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => apiMutate('/auth/verify-email', { body: { token }, schema: messageResponseSchema }),
    // Verifying flips emailVerified, or moves a pending address into place.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.me() }),
  });
}

export function useResendVerification() {
  return useMutation({
    mutationFn: (body: { email: string }) => apiMutate('/auth/resend-verification', { body, schema: messageResponseSchema }),
  });
}

export function useForgotPassword() {
  return useMutation({
    mutationFn: (body: { email: string }) => apiMutate('/auth/forgot-password', { body, schema: messageResponseSchema }),
  });
}

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { token: string; password: string }) =>
      apiMutate('/auth/reset-password', { body, schema: messageResponseSchema }),
    // A reset may end the sessions of the account it belongs to, possibly this one.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.me() }),
  });
}

/**
 * Only same-app paths are followed after sign-in; anything else (another host, "//host",
 * a scheme) falls back, so a crafted link cannot send a racer elsewhere.
 */
export function safeNextPath(next: unknown, fallback = '/profile'): string {
  if (typeof next !== 'string' || !next.startsWith('/') || next.startsWith('//') || next.includes('\\')) return fallback;
  return next;
}

/** The sign-in address that brings the racer back to `path` afterwards. */
export function signInHref(path: string): string {
  return `/sign-in?next=${encodeURIComponent(path)}`;
}

// The GitHub flow is a chain of redirects through the provider, so it is a navigation, not a fetch.
function navigateToApi(path: string): void {
  const url = apiUrl(path);
  if (Platform.OS === 'web') window.location.assign(url);
  else void Linking.openURL(url);
}

export function continueWithGithub(next: string): void {
  navigateToApi(`/auth/github?next=${encodeURIComponent(safeNextPath(next))}`);
}

export function linkGithub(): void {
  navigateToApi('/auth/github/link');
}
