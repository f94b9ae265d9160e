import { EditBathScreen } from '@/components/screens/baths/edit-bath-screen';

/** /baths/edit/<id>: the bath's record to change (chemists and technicians). */
export default EditBathScreen;
