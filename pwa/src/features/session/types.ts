import type { Role } from '@siteband/shared';

/** The signed-in person as the API describes them. */
export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
}

/** Body of a successful sign-in or token refresh. */
export interface AuthResponse {
  accessToken: string;
  refreshToken: string;
  /** Lifetime of the access token in seconds. */
  accessTokenExpiresIn: number;
  user: SessionUser;
}

/** The session kept on the tablet so the shell works after a reload and offline. */
export interface StoredSession {
  user: SessionUser;
  accessToken: string;
  refreshToken: string;
  /** Epoch milliseconds when the access token stops being accepted. */
  accessTokenExpiresAt: number;
  /** Epoch milliseconds of the last time the server accepted this session; the offline period counts from here. */
  confirmedAt: number;
}

/** Email and password typed on the sign-in page. */
export interface Credentials {
  email: string;
  password: string;
}
