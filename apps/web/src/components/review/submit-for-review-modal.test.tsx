import { afterEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/lib/session';
import { jsonResponse, render, screen } from '@/testing/render';
import { SubmitForReviewModal } from './submit-for-review-modal';

// An admin may write and review, so the list holds them; they must not review their own work.
const author = { id: '0b5c7f3e-1d2a-4c3b-9e8f-7a6b5c4d3e2f', email: 'maren.holt@brackwater.example', name: 'Maren Holt', role: 'admin' as const };
const reviewer = { id: '5d1e2f3a-4b5c-4d6e-8f7a-9b0c1d2e3f4a', email: 'sunniva.lind@brackwater.example', name: 'Sunniva Lind', role: 'reviewer' as const };

function show(onSubmit = vi.fn()) {
  const { user } = render(
    <SubmitForReviewModal opened title="Submit BW-STD-112 for review" intro="The reviewers you pick get a mail." noteHint="Optional" dirty={false} submitting={false} onClose={() => {}} onSubmit={onSubmit} />,
  );
  return { onSubmit, user };
}

describe('SubmitForReviewModal', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('never offers the author as a reviewer, asks for one at the field, and sends the trimmed note', async () => {
    session.signIn({ accessToken: 'author-token', expiresIn: 900, user: author });
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(200, { items: [author, reviewer] })));
    const { onSubmit, user } = show();

    await user.click(screen.getByRole('button', { name: 'Submit for review' }));
    expect(await screen.findByText('Pick at least one reviewer')).toBeInTheDocument();
    expect(onSubmit).not.toHaveBeenCalled();

    await user.click(screen.getAllByLabelText(/^Reviewers/).find((element) => element.tagName === 'INPUT')!);
    const offered = await screen.findByRole('option', { name: /Sunniva Lind/ });
    expect(screen.queryByRole('option', { name: /Maren Holt/ })).toBeNull();
    await user.click(offered);
    await user.type(screen.getByRole('textbox', { name: /Note for the reviewers/ }), '  Wall rule tightened  ');
    await user.click(screen.getByRole('button', { name: 'Submit for review' }));
    expect(onSubmit).toHaveBeenCalledWith({ reviewerIds: [reviewer.id], note: 'Wall rule tightened' });
  });
});
