import { LibraryScreen } from '@/components/screens/library/library-screen';

/** /library: the constants library, searchable and filterable. */
export default LibraryScreen;
