import type { CommentDto, History, RevisionDetail } from '../../../shared/types/forks';
import type { SetupDetail } from '../../../shared/types/setups';

/** Juno's electric buggy setup in the invented demo world, five revisions deep. */
export function setupFixture(overrides: Partial<SetupDetail> = {}): SetupDetail {
  return {
    id: 7,
    title: 'Hollow Pines — loose and dusty',
    visibility: 'public',
    shareToken: null,
    owner: { handle: 'juno_braithwick', displayName: 'Juno Braithwick' },
    isOwner: false,
    car: { id: 3, nickname: 'Blue Stoat', kitName: 'Stoat 8E', makerName: 'Ottervale Kitworks', stock: false },
    vehicleClass: 'buggy-1-8-electric',
    templateVersion: 1,
    conditions: { trackType: 'loose-dusty', temperatureC: 24, grip: 'low' },
    notesMarkdown: '',
    notesHtml: '',
    currentRevision: { id: 55, number: 5, values: { 'shock.rear.oil': 500 }, changeNote: 'Rear oil up for the ruts.', createdAt: '2026-11-30T18:00:00.000Z' },
    revisions: [5, 4, 3, 2, 1].map((number) => ({
      id: 10 * number + 5,
      number,
      changeNote: `Change ${number}`,
      authorHandle: 'juno_braithwick',
      createdAt: `2026-11-2${number}T10:00:00.000Z`,
      changedFieldCount: number === 1 ? 0 : 1,
      noteHidden: false,
    })),
    photos: [],
    lineage: { forkedFrom: null, forkCount: 0, familyForkCount: 0 },
    commentCount: 0, hidden: null,
    createdAt: '2026-11-21T10:00:00.000Z',
    updatedAt: '2026-11-30T18:00:00.000Z',
    ...overrides,
  };
}

export function revisionFixture(number: number, values: RevisionDetail['revision']['values']): RevisionDetail {
  return {
    setup: { id: 7, title: 'Hollow Pines — loose and dusty', vehicleClass: 'buggy-1-8-electric', ownerHandle: 'juno_braithwick', kitName: 'Stoat 8E', revisionCount: 5 },
    revision: { id: 10 * number + 5, number, values, changeNote: `Change ${number}`, authorHandle: 'juno_braithwick', createdAt: `2026-11-2${number}T10:00:00.000Z` },
  };
}

export const historyFixture: History = {
  revisions: [
    {
      id: 55,
      number: 5,
      changeNote: 'Rear oil up for the ruts.',
      authorHandle: 'juno_braithwick',
      createdAt: '2026-11-25T10:00:00.000Z',
      changes: [{ key: 'shock.rear.oil', before: 450, after: 500 }],
    },
    {
      id: 45,
      number: 4,
      changeNote: 'Lower at the front.',
      authorHandle: 'juno_braithwick',
      createdAt: '2026-11-24T10:00:00.000Z',
      changes: [{ key: 'susp.front.ride-height', before: 27, after: 26 }],
    },
  ],
};

export function commentFixture(overrides: Partial<CommentDto>): CommentDto {
  return {
    id: 1,
    setupId: 7,
    revisionId: null,
    revisionNumber: null,
    fieldKey: null,
    fieldLabel: null,
    parentId: null,
    author: { handle: 'pell-strand', displayName: 'Pell Strand' },
    bodyHtml: '<p>Ran this at Saltmarsh Raceway: spot on.</p>',
    bodyMarkdown: '',
    createdAt: '2026-11-30T19:00:00.000Z',
    editedAt: null,
    deleted: false,
    canEdit: false,
    canDelete: false,
    replies: [],
    ...overrides,
  };
}

export const signedInJuno = {
  id: 2, handle: 'juno_braithwick', displayName: 'Juno Braithwick', email: 'juno@racers.example', emailVerified: true, pendingEmail: null,
  role: 'racer', bio: '', homeTrack: 'Hollow Pines Circuit', classesRaced: ['buggy-1-8-electric'], units: { length: 'mm', temperature: 'C' },
  hasPassword: true, githubLogin: null, createdAt: '2025-03-01T10:00:00.000Z',
} as const;
