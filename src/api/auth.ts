import {
  acceptInvitationRequest,
  invitationPreview,
  sessionResponse,
  type AcceptInvitationRequest,
  type SessionResponse,
  type SignInRequest,
  type SignUpRequest,
} from '@/shared/schemas';
import { queryOptions } from '@tanstack/react-query';
import { ApiRequestError, request, setCsrfToken } from './client';
import { STALE } from './query-client';

export const authKeys = {
  root: ['auth'] as const,
  invitation: (token: string) => [...authKeys.root, 'invitation', token] as const,
};

function remember(session: SessionResponse): SessionResponse {
  setCsrfToken(session.csrfToken);
  return session;
}

/** The current session, or null when signed out (401 is an answer here, not an error). */
export async function fetchSession(): Promise<SessionResponse | null> {
  try {
    return remember(await request('GET', '/api/auth/session', { schema: sessionResponse }));
  } catch (e) {
    if (e instanceof ApiRequestError && e.status === 401) {
      setCsrfToken(null);
      return null;
    }
    throw e;
  }
}

export async function signIn(body: SignInRequest): Promise<SessionResponse> {
  return remember(await request('POST', '/api/auth/sign-in', { body, schema: sessionResponse }));
}

export async function signUp(body: SignUpRequest): Promise<SessionResponse> {
  return remember(await request('POST', '/api/auth/sign-up', { body, schema: sessionResponse }));
}

export async function signOut(): Promise<void> {
  await request<void>('POST', '/api/auth/sign-out');
  setCsrfToken(null);
}

export async function acceptInvitation(
  token: string,
  body: AcceptInvitationRequest,
): Promise<SessionResponse> {
  return remember(
    await request('POST', `/api/invitations/${encodeURIComponent(token)}/accept`, {
      body: acceptInvitationRequest.parse(body),
      schema: sessionResponse,
    }),
  );
}

export const authQueries = {
  invitation: (token: string) =>
    queryOptions({
      queryKey: authKeys.invitation(token),
      queryFn: () =>
        request('GET', `/api/invitations/${encodeURIComponent(token)}`, {
          schema: invitationPreview,
        }),
      staleTime: STALE.medium,
    }),
};
