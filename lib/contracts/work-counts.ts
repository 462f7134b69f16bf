// What a person's home screen counts, and the senior's sign-off queue.

export interface WorkCounts {
  /** Cases this person started and has not submitted yet. */
  myDrafts: number;
  /** This person's cases a senior sent back. */
  sentBackToMe: number;
  /** Cases waiting for a sign-off this person may give; null for a role that does not sign off. */
  waitingForMySignOff: number | null;
  /** The shop's cases not closed yet, whoever has them. */
  shopOpen: number;
}

export interface SignOffQueueItem {
  id: number;
  vehicle: string | null;
  complaint: string;
  technician: string;
  /** When the apprentice submitted it (ISO 8601): the queue is oldest first. */
  submittedAt: string;
}

export interface SignOffQueue {
  total: number;
  items: SignOffQueueItem[];
}
