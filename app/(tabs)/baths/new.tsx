import { NewBathScreen } from '@/components/screens/baths/new-bath-screen';

/** /baths/new: a new bath record (chemists and technicians). */
export default NewBathScreen;
