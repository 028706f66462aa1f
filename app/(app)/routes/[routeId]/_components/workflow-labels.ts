import type { RouteStatus } from '@/lib/schemas/workflow';

// What each move is called on its button and in its dialog.
export const MOVE_LABELS: Record<RouteStatus, { action: string; title: string; explain: string }> = {
  in_review: { action: 'Send for review', title: 'Send for review', explain: 'The reviewers you name are told by e-mail and in Stepwell. They can comment and flag steps; the lead approves.' },
  changes_requested: { action: 'Ask for changes', title: 'Ask for changes', explain: 'The route goes back to its designer with your note.' },
  approved: { action: 'Approve', title: 'Approve this route', explain: 'Approval is recorded with your name. Any later edit sends the route back to draft.' },
  shelved: { action: 'Shelve', title: 'Shelve this route', explain: 'A shelved route stays readable; a lead can return it to draft.' },
  draft: { action: 'Return to draft', title: 'Return to draft', explain: 'The route becomes an editable draft again.' },
};

/** The approve button while flags or threads are still open: the lead knowingly approves over them. */
export const APPROVE_ANYWAY = 'Approve with these open';
