import { ReviewQueueScreen } from '@/components/screens/library/review-queue-screen';

/** /library/review: drafts waiting for a reviewer's decision. */
export default ReviewQueueScreen;
