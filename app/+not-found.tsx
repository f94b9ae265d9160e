import { NotFoundScreen } from '@/components/screens/not-found/not-found-screen';

/** Catch-all route for unknown addresses. */
export default NotFoundScreen;
