import { apiKey } from '@better-auth/api-key';
import { type BetterAuthOptions, betterAuth } from 'better-auth';
import { admin, organization } from 'better-auth/plugins';
import type pg from 'pg';
import { API_KEY_GRANTS, FIRM_ROLE_LABELS, isFirmRole } from '../../permissions/roles';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '../../schemas/account';
import type { OutgoingMail } from '../mail/mailer';
import { existingAccountMail, invitationMail, passwordResetMail, verificationMail } from '../mail/templates';
import { firmAccessControl, firmAccessRoles, platformAccessControl, platformAccessRoles } from './access-control';
import type { RateLimitStorage } from './rate-limit';

/** The header our auth route fills from the socket address; anything a client sends under it is dropped. */
export const CLIENT_IP_HEADER = 'x-claybank-client-ip';
export const FIRM_KEY_CONFIG = 'firm-keys';

export interface AuthEvents {
  signedIn(event: { userId: string; ipAddress: string | null }): Promise<void>;
  firstFirmOf(userId: string): Promise<string | null>;
}

export interface AuthDependencies {
  pool: pg.Pool;
  appUrl: string;
  secret: string;
  sendMail(mail: OutgoingMail): Promise<void>;
  rateLimitStorage: RateLimitStorage;
  events: AuthEvents;
  extraPlugins?: BetterAuthOptions['plugins'];
}

/** Sends without making the caller wait (and without letting the time taken reveal anything). */
function dispatch(send: (mail: OutgoingMail) => Promise<void>, mail: OutgoingMail) {
  send(mail).catch((error: unknown) => console.error(`[mail] could not send "${mail.subject}":`, error));
}

/** Sign-in, firms, platform roles and firm API keys, on the project's PostgreSQL. */
export function createAuth(deps: AuthDependencies) {
  const { appUrl } = deps;
  return betterAuth({
    appName: 'Claybank',
    baseURL: appUrl,
    secret: deps.secret,
    database: deps.pool,
    telemetry: { enabled: false },
    trustedOrigins: [appUrl],
    emailAndPassword: {
      enabled: true,
      requireEmailVerification: true,
      autoSignIn: false,
      minPasswordLength: PASSWORD_MIN_LENGTH,
      maxPasswordLength: PASSWORD_MAX_LENGTH,
      revokeSessionsOnPasswordReset: true,
      resetPasswordTokenExpiresIn: 3600,
      sendResetPassword: async ({ user, url }) => dispatch(deps.sendMail, passwordResetMail(user.email, user.name, url)),
      onExistingUserSignUp: async ({ user }) =>
        dispatch(deps.sendMail, existingAccountMail(user.email, user.name, `${appUrl}/sign-in`, `${appUrl}/forgot-password`)),
      customSyntheticUser: ({ coreFields, additionalFields, id }) => ({
        ...coreFields,
        role: 'user',
        banned: false,
        banReason: null,
        banExpires: null,
        ...additionalFields,
        id,
      }),
    },
    emailVerification: {
      sendOnSignUp: true,
      sendOnSignIn: true,
      autoSignInAfterVerification: true,
      expiresIn: 24 * 3600,
      sendVerificationEmail: async ({ user, url }) => dispatch(deps.sendMail, verificationMail(user.email, user.name, url)),
    },
    session: {
      expiresIn: 7 * 24 * 3600,
      updateAge: 24 * 3600,
      cookieCache: { enabled: false },
    },
    rateLimit: { enabled: true, window: 60, max: 120, customStorage: deps.rateLimitStorage },
    advanced: {
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
      useSecureCookies: appUrl.startsWith('https://'),
    },
    databaseHooks: {
      session: {
        create: {
          before: async (session) => {
            const firmId = await deps.events.firstFirmOf(session.userId);
            return { data: { ...session, activeOrganizationId: firmId } };
          },
          after: async (session) => {
            await deps.events.signedIn({ userId: session.userId, ipAddress: session.ipAddress ?? null });
          },
        },
      },
    },
    plugins: [
      organization({
        ac: firmAccessControl,
        roles: firmAccessRoles,
        creatorRole: 'owner',
        allowUserToCreateOrganization: true,
        invitationExpiresIn: 7 * 24 * 3600,
        cancelPendingInvitationsOnReInvite: true,
        requireEmailVerificationOnInvitation: true,
        sendInvitationEmail: async ({ id, email, role, organization: firm, inviter }) => {
          const roleLabel = isFirmRole(role) ? FIRM_ROLE_LABELS[role] : role;
          dispatch(deps.sendMail, invitationMail(email, inviter.user.name, firm.name, roleLabel, `${appUrl}/invitations/${id}`));
        },
      }),
      admin({ ac: platformAccessControl, roles: platformAccessRoles, defaultRole: 'user', adminRoles: ['admin'] }),
      apiKey([
        {
          configId: FIRM_KEY_CONFIG,
          references: 'organization',
          defaultPrefix: 'cbk_',
          requireName: true,
          maximumNameLength: 60,
          // Partner scripts upload in batches; the plugin's default (10 a day) would stop them.
          rateLimit: { enabled: true, timeWindow: 60_000, maxRequests: 600 },
          permissions: { defaultPermissions: { ...API_KEY_GRANTS } },
        },
      ]),
      ...(deps.extraPlugins ?? []),
    ],
  });
}

export type Auth = ReturnType<typeof createAuth>;
