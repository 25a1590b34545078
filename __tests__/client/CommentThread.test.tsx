import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { CommentForm } from '../../components/CommentForm';
import { CommentThread, countVisibleComments, type CommentThreadProps } from '../../components/CommentThread';
import { ApiRequestError } from '../../hooks/api';
import type { CommentDto } from '../../shared/types/forks';
import { renderThemed } from './support/render';

// expo-router's navigation runtime does not load under jest; a Link here only wraps its child.
jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

const NOW = Date.parse('2026-12-01T18:30:00.000Z');
const minutesAgo = (n: number) => new Date(NOW - n * 60_000).toISOString();

function comment(overrides: Partial<CommentDto>): CommentDto {
  return {
    id: 1,
    setupId: 7,
    revisionId: 44,
    revisionNumber: 4,
    fieldKey: null,
    fieldLabel: null,
    parentId: null,
    author: { handle: 'pell-strand', displayName: 'Pell Strand' },
    bodyHtml: '<p>Why so thin at the rear?</p>',
    bodyMarkdown: '',
    createdAt: minutesAgo(90),
    editedAt: null,
    deleted: false,
    canEdit: false,
    canDelete: false,
    replies: [],
    ...overrides,
  };
}

function actions() {
  return { reply: jest.fn(() => Promise.resolve()), edit: jest.fn(() => Promise.resolve()), remove: jest.fn(() => Promise.resolve()) };
}

function renderThread(comments: CommentDto[], overrides: Partial<CommentThreadProps> = {}) {
  const props: CommentThreadProps = { comments, actions: actions(), signedIn: true, signInHref: '/sign-in', label: 'Comments on revision 4', now: NOW, ...overrides };
  renderThemed(<CommentThread {...props} />);
  return props;
}

describe('CommentThread', () => {
  it('shows who wrote each comment, when, the field it is about and that it was edited', () => {
    renderThread([
      comment({ id: 1, fieldKey: 'shock.rear.oil', fieldLabel: 'Rear shock oil', editedAt: minutesAgo(80) }),
      comment({ id: 2, author: { handle: 'juno_braithwick', displayName: 'Juno Braithwick' }, bodyHtml: '<p>Bumpy back straight.</p>', createdAt: minutesAgo(5) }),
    ]);
    expect(screen.getByRole('link', { name: '@pell-strand' })).toBeTruthy();
    expect(screen.getByText('1 h ago · edited · on Rear shock oil')).toBeTruthy();
    expect(screen.getByText('Why so thin at the rear?')).toBeTruthy();
    expect(screen.getByText('5 min ago')).toBeTruthy();
    expect(screen.getByText('Bumpy back straight.')).toBeTruthy();
  });

  it('tells the author a hidden comment is hidden, why, and how to appeal; a moderator gets no appeal link', () => {
    const hidden = { hiddenAt: '2026-12-01T12:00:00.000Z', reason: 'Shop link in every comment.', autoHidden: false, actionId: 31 };
    renderThread([comment({ id: 1, bodyMarkdown: 'Cheap bushings here', hidden })]);
    expect(screen.getByText('Hidden by moderators')).toBeTruthy();
    expect(screen.getByText(/Shop link in every comment\./)).toBeTruthy();
    expect(screen.getByText(/Only you and the moderators can see this comment/)).toBeTruthy();
    expect(screen.getByText(/You can appeal once, within 20 days/)).toBeTruthy();
  });

  it('shows a moderator the hidden notice on someone else’s comment without offering them the appeal', () => {
    const hidden = { hiddenAt: '2026-12-01T12:00:00.000Z', reason: 'Shop link in every comment.', autoHidden: false, actionId: 31 };
    renderThread([comment({ id: 1, hidden })]);
    expect(screen.getByText('Hidden by moderators')).toBeTruthy();
    expect(screen.getByText(/Only its author and the moderators can see this comment/)).toBeTruthy();
    expect(screen.queryByText(/You can appeal/)).toBeNull();
  });

  it('shows a deleted comment as deleted, without its words or actions, and keeps its replies', () => {
    renderThread([
      comment({
        deleted: true,
        bodyHtml: '',
        editedAt: minutesAgo(60),
        canDelete: true,
        replies: [comment({ id: 3, parentId: 1, author: { handle: 'oskar-velde', displayName: 'Oskar Velde' }, bodyHtml: '<p>It was about the rear oil.</p>' })],
      }),
    ]);
    expect(screen.getByText('This comment was deleted.')).toBeTruthy();
    expect(screen.queryByText(/edited/)).toBeNull();
    expect(screen.queryByRole('button', { name: 'Reply to @pell-strand' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Delete the comment by @pell-strand' })).toBeNull();
    const replies = screen.getByLabelText('Replies to @pell-strand');
    expect(within(replies).getByText('It was about the rear oil.')).toBeTruthy();
  });

  it('offers a reply on top-level comments only, and sends it with the comment it answers', async () => {
    const props = renderThread([comment({ replies: [comment({ id: 3, parentId: 1, author: { handle: 'oskar-velde', displayName: 'Oskar Velde' } })] })]);
    expect(screen.queryByRole('button', { name: 'Reply to @oskar-velde' })).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Reply to @pell-strand' }));
    fireEvent.changeText(screen.getByLabelText('Reply to @pell-strand'), 'Rear hub toe went up too.');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Post reply' })));
    expect(props.actions.reply).toHaveBeenCalledWith(expect.objectContaining({ id: 1 }), 'Rear hub toe went up too.');
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Post reply' })).toBeNull());
  });

  it('offers no reply box to signed-out readers', () => {
    renderThread([comment({})], { signedIn: false });
    expect(screen.queryByRole('button', { name: 'Reply to @pell-strand' })).toBeNull();
  });

  it('lets the author edit within the edit window, starting from the markdown', async () => {
    const props = renderThread([comment({ canEdit: true, canDelete: true, createdAt: minutesAgo(3), bodyMarkdown: 'Why so *thin*?' })]);
    fireEvent.press(screen.getByRole('button', { name: 'Edit your comment' }));
    expect(screen.getByLabelText('Edit your comment')).toHaveDisplayValue('Why so *thin*?');
    fireEvent.changeText(screen.getByLabelText('Edit your comment'), 'Why so *thin* at the rear?');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Save changes' })));
    expect(props.actions.edit).toHaveBeenCalledWith(1, 'Why so *thin* at the rear?');
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Save changes' })).toBeNull());
  });

  it('stops offering an edit once the 15-minute window has passed (common practice, no source)', () => {
    renderThread([comment({ canEdit: true, canDelete: true, createdAt: minutesAgo(16) })]);
    expect(screen.queryByRole('button', { name: 'Edit your comment' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Delete the comment by @pell-strand' })).toBeTruthy();
  });

  it('asks before deleting, and keeps the comment when the racer backs out', async () => {
    const props = renderThread([comment({ canDelete: true })]);
    fireEvent.press(screen.getByRole('button', { name: 'Delete the comment by @pell-strand' }));
    expect(screen.getByText('Delete this comment? Its words go; replies to it stay.')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Keep it' }));
    expect(props.actions.remove).not.toHaveBeenCalled();
    fireEvent.press(screen.getByRole('button', { name: 'Delete the comment by @pell-strand' }));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Delete comment' })));
    expect(props.actions.remove).toHaveBeenCalledWith(1);
  });

  it('shows why a delete failed', async () => {
    const remove = jest.fn(() => Promise.reject(new ApiRequestError(403, 'forbidden', 'Only the author or a moderator can delete this comment.')));
    renderThread([comment({ canDelete: true })], { actions: { ...actions(), remove } });
    fireEvent.press(screen.getByRole('button', { name: 'Delete the comment by @pell-strand' }));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Delete comment' })));
    expect(screen.getByText('Only the author or a moderator can delete this comment.')).toBeTruthy();
  });

  it('counts comments and replies that are not deleted', () => {
    const thread = [comment({ deleted: true, replies: [comment({ id: 2 }), comment({ id: 3, deleted: true })] }), comment({ id: 4 })];
    expect(countVisibleComments(thread)).toBe(2);
  });
});

describe('CommentForm', () => {
  function renderForm(onSubmit: (body: string) => Promise<unknown>, signedIn: boolean | undefined = true) {
    renderThemed(<CommentForm label="Comment on revision 4" submitLabel="Post comment" onSubmit={onSubmit} signedIn={signedIn} signInHref="/sign-in?next=%2Fsetups%2F7" />);
  }

  it('counts towards the 5,000 character limit and refuses more', () => {
    const onSubmit = jest.fn(() => Promise.resolve());
    renderForm(onSubmit);
    fireEvent.changeText(screen.getByLabelText('Comment on revision 4'), 'x'.repeat(5_001));
    expect(screen.getByText('5,001 of 5,000 characters — 1 too many')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Post comment' })).toBeDisabled();
  });

  it('says what to write when the box is empty, without calling the server', () => {
    const onSubmit = jest.fn(() => Promise.resolve());
    renderForm(onSubmit);
    fireEvent.changeText(screen.getByLabelText('Comment on revision 4'), '   ');
    fireEvent.press(screen.getByRole('button', { name: 'Post comment' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByRole('alert')).toHaveTextContent('Write something before posting.');
  });

  it('is busy while posting, then empties; a server refusal keeps the words and shows the message', async () => {
    let finish: (ok: boolean) => void = () => {};
    const onSubmit = jest.fn(
      () =>
        new Promise((resolve, reject) => {
          finish = (ok) => (ok ? resolve(undefined) : reject(new ApiRequestError(400, 'validation_failed', 'Some fields need another look.', { bodyMarkdown: 'Links to other sites are not allowed yet.' })));
        }),
    );
    renderForm(onSubmit);
    const box = screen.getByLabelText('Comment on revision 4');
    fireEvent.changeText(box, 'See https://example.invalid');
    fireEvent.press(screen.getByRole('button', { name: 'Post comment' }));
    expect(screen.getByRole('button', { name: 'Posting…' })).toBeDisabled();
    await act(async () => finish(false));
    expect(screen.getByRole('alert')).toHaveTextContent('Links to other sites are not allowed yet.');
    expect(screen.getByLabelText('Comment on revision 4')).toHaveDisplayValue('See https://example.invalid');
    fireEvent.press(screen.getByRole('button', { name: 'Post comment' }));
    await act(async () => finish(true));
    expect(screen.getByLabelText('Comment on revision 4')).toHaveDisplayValue('');
  });

  it('offers signed-out readers a way to sign in instead of the box', () => {
    renderForm(jest.fn(), false);
    expect(screen.queryByLabelText('Comment on revision 4')).toBeNull();
    expect(screen.getByRole('link', { name: 'Sign in to comment' })).toBeTruthy();
  });
});
