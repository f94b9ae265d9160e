import { BathsScreen } from '@/components/screens/baths/baths-screen';

/** /baths: the bath list, searchable and filterable by process and status. */
export default BathsScreen;
