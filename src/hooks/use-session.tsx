import { useQueryClient } from '@tanstack/react-query';
import {
  createContext,
  useCallback,
  useContext,
  useEffect,
  useMemo,
  useRef,
  useState,
  type ReactNode,
} from 'react';
import * as auth from '@/src/api/auth';
import { ApiRequestError } from '@/src/api/client';
import type { Role } from '@/shared/roles';
import type {
  AcceptInvitationRequest,
  MembershipSummary,
  SessionResponse,
  SignInRequest,
  SignUpRequest,
  UserSummary,
} from '@/shared/schemas';

export type SessionStatus = 'loading' | 'signed-out' | 'signed-in';

export type SessionValue = {
  status: SessionStatus;
  user: UserSummary | null;
  memberships: MembershipSummary[];
  active: MembershipSummary | null;
  setActiveWorkshop(id: string): void;
  signOut(): Promise<void>;
  signIn(body: SignInRequest): Promise<void>;
  signUp(body: SignUpRequest): Promise<void>;
  acceptInvitation(token: string, body: AcceptInvitationRequest): Promise<void>;
  /** Re-read the session (after a change to the caller's own memberships). */
  refresh(): Promise<void>;
  /** Why the first session check failed (network, server), when it did. */
  loadError: unknown;
};

const ACTIVE_KEY = 'soundframe.activeWorkshop';

// Web keeps the choice across reloads; elsewhere it lasts for the running app.
const storage = {
  get(): string | null {
    try {
      return globalThis.localStorage?.getItem(ACTIVE_KEY) ?? null;
    } catch {
      return null;
    }
  },
  set(id: string) {
    try {
      globalThis.localStorage?.setItem(ACTIVE_KEY, id);
    } catch {
      // Private mode or no storage: the choice simply is not remembered.
    }
  },
};

const SessionContext = createContext<SessionValue | null>(null);

export function SessionProvider({ children }: { children: ReactNode }) {
  const queryClient = useQueryClient();
  const [status, setStatus] = useState<SessionStatus>('loading');
  const [session, setSessionState] = useState<SessionResponse | null>(null);
  const [activeId, setActiveId] = useState<string | null>(() => storage.get());
  const [loadError, setLoadError] = useState<unknown>(null);
  const userIdRef = useRef<string | null>(null);

  const apply = useCallback(
    (next: SessionResponse | null) => {
      const nextUser = next?.user.id ?? null;
      // Another person's (or nobody's) data must never show from the cache.
      if (userIdRef.current !== nextUser) queryClient.clear();
      userIdRef.current = nextUser;
      setSessionState(next);
      setStatus(next ? 'signed-in' : 'signed-out');
    },
    [queryClient],
  );

  const load = useCallback(async () => {
    try {
      apply(await auth.fetchSession());
      setLoadError(null);
    } catch (e) {
      setLoadError(e);
      apply(null);
    }
  }, [apply]);

  useEffect(() => {
    let live = true;
    auth.fetchSession().then(
      (s) => {
        if (live) apply(s);
      },
      (e) => {
        if (!live) return;
        setLoadError(e);
        apply(null);
      },
    );
    return () => {
      live = false;
    };
  }, [apply]);

  // Any request answered 401 means the session ended (expiry, sign-out in another tab).
  useEffect(() => {
    const isUnauth = (e: unknown) => e instanceof ApiRequestError && e.status === 401;
    const q = queryClient.getQueryCache().subscribe((ev) => {
      if (ev.type === 'updated' && ev.action.type === 'error' && isUnauth(ev.action.error))
        apply(null);
    });
    const m = queryClient.getMutationCache().subscribe((ev) => {
      if (ev.type === 'updated' && ev.action.type === 'error' && isUnauth(ev.action.error))
        apply(null);
    });
    return () => {
      q();
      m();
    };
  }, [queryClient, apply]);

  const memberships = useMemo(() => session?.memberships ?? [], [session]);
  const active = memberships.find((m) => m.workshopId === activeId) ?? memberships[0] ?? null;

  const setActiveWorkshop = useCallback((id: string) => {
    storage.set(id);
    setActiveId(id);
  }, []);

  const signOut = useCallback(async () => {
    try {
      await auth.signOut();
    } finally {
      apply(null);
    }
  }, [apply]);

  const value = useMemo<SessionValue>(
    () => ({
      status,
      user: session?.user ?? null,
      memberships,
      active,
      setActiveWorkshop,
      signOut,
      signIn: async (body) => apply(await auth.signIn(body)),
      signUp: async (body) => {
        const s = await auth.signUp(body);
        if (s.memberships[0]) setActiveWorkshop(s.memberships[0].workshopId);
        apply(s);
      },
      acceptInvitation: async (token, body) => {
        const before = new Set(session?.memberships.map((m) => m.workshopId));
        const s = await auth.acceptInvitation(token, body);
        // Open the workshop that just invited this person.
        const joined = s.memberships.find((m) => !before.has(m.workshopId));
        if (joined) setActiveWorkshop(joined.workshopId);
        apply(s);
      },
      refresh: load,
      loadError,
    }),
    [status, session, memberships, active, setActiveWorkshop, signOut, apply, load, loadError],
  );

  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionValue {
  const value = useContext(SessionContext);
  if (!value) throw new Error('useSession must be used inside <SessionProvider>');
  return value;
}

/** The active workshop's id. Only for screens inside the signed-in layout, which guarantees one. */
export function useWorkshopId(): string {
  const { active } = useSession();
  if (!active) throw new Error('useWorkshopId needs a signed-in member of a workshop');
  return active.workshopId;
}

/** The caller's role in the active workshop; the least-privileged role when there is none. */
export function useRole(): Role {
  return useSession().active?.role ?? 'client';
}
