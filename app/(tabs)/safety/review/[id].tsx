import { ReviewScreen } from '@/components/screens/safety/review-screen';

/** /safety/review/:id: one review on the safety desk. */
export default ReviewScreen;
