import { LibraryScreen } from '@/components/screens/library/library-screen';

/** /library: the Library section's landing screen. */
export default LibraryScreen;
