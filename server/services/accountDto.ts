import type { AdminUser, Me, PublicRacer } from '../../shared/types/auth';
import type { User } from '../models/User';
import { renderMarkdown } from './markdown';

export function toMe(user: User): Me {
  return {
    id: user.id,
    handle: user.handle,
    displayName: user.displayName,
    email: user.email,
    emailVerified: user.emailVerifiedAt !== null && user.email !== null,
    pendingEmail: user.pendingEmail,
    role: user.role,
    bio: user.bio,
    homeTrack: user.homeTrack,
    classesRaced: user.classesRaced,
    units: { length: user.unitsLength, temperature: user.unitsTemperature },
    hasPassword: user.passwordHash !== null,
    githubLogin: user.githubLogin,
    createdAt: user.createdAt.toISOString(),
  };
}

export function toPublicRacer(user: User): PublicRacer {
  return {
    id: user.id,
    handle: user.handle,
    displayName: user.displayName,
    bioHtml: renderMarkdown(user.bio),
    joinedAt: user.createdAt.toISOString(),
    homeTrack: user.homeTrack,
    classesRaced: user.classesRaced,
    role: user.role,
  };
}

export function toAdminUser(user: User): AdminUser {
  return {
    id: user.id,
    handle: user.handle,
    displayName: user.displayName,
    email: user.email,
    emailVerified: user.emailVerifiedAt !== null,
    role: user.role,
    createdAt: user.createdAt.toISOString(),
    suspendedUntil: user.suspendedUntil ? user.suspendedUntil.toISOString() : null,
    suspendedIndefinitely: user.suspendedIndefinitely,
    suspensionReason: user.suspensionReason,
  };
}

/** "until 3 January 2027" or "until an admin lifts it", for suspension messages. */
export function describeSuspension(user: User): string {
  if (user.suspendedIndefinitely || !user.suspendedUntil) return 'until an admin lifts it';
  return `until ${user.suspendedUntil.toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' })}`;
}
