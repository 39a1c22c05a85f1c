// A comment as shown: one thread is a pinned (or row) comment with its answers.
export interface CommentView {
  id: string;
  planId: string;
  revisionId: string | null;
  parentId: string | null;
  xPx: number | null;
  yPx: number | null;
  target: string | null;
  body: string;
  authorName: string;
  resolved: boolean;
  resolvedByName: string | null;
  createdAt: string;
}

export interface CommentThread extends CommentView { answers: CommentView[] }
