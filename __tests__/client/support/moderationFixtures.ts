import type { ActionOnMe, MyLimits, QueueItem } from '../../../shared/types/moderation';

/** A spam setup by an invented day-old account, reported twice. */
export function queueItemFixture(overrides: Partial<QueueItem> = {}): QueueItem {
  return {
    targetType: 'setup',
    targetId: 41,
    reportCount: 2,
    reasons: [
      { reason: 'spam', count: 2 },
    ],
    notes: ['Links to a tyre shop in every line.'],
    firstReportedAt: '2026-12-01T09:00:00.000Z',
    content: {
      title: 'CHEAP TYRES — best grip deals',
      bodyHtml: '<p>Buy now at the link below.</p>',
      imageUrl: null,
      path: '/setups/41',
      hiddenAt: null,
      hiddenReason: null,
      autoHidden: false,
    },
    author: {
      id: 90,
      handle: 'spoke_deals',
      role: 'racer',
      createdAt: '2026-11-30T09:00:00.000Z',
      emailVerified: false,
      suspended: false,
      suspendedUntil: null,
      history: [],
    },
    appeal: null,
    canAct: true,
    cannotActReason: null,
    ...overrides,
  };
}

export function limitsFixture(overrides: Partial<MyLimits> = {}): MyLimits {
  return {
    limited: true,
    because: ['new-account', 'unverified'],
    ageLiftsAt: '2026-12-02T10:00:00.000Z',
    setups: { perHour: 3, usedThisHour: 1 },
    comments: { perHour: 5, usedThisHour: 5 },
    linksPerPost: 2,
    photosAllowed: false,
    ...overrides,
  };
}

export function actionOnMeFixture(overrides: Partial<ActionOnMe> = {}): ActionOnMe {
  return {
    id: 12,
    action: 'hide',
    targetType: 'setup',
    targetId: 41,
    reason: 'Spam or advertising.',
    createdAt: '2026-12-01T10:00:00.000Z',
    suspendedUntil: null,
    resolvedReports: 2,
    targetLabel: 'CHEAP TYRES — best grip deals',
    targetPath: '/setups/41',
    appealUntil: '2026-12-21T10:00:00.000Z',
    canAppeal: true,
    cannotAppealReason: null,
    appeal: null,
    ...overrides,
  };
}
