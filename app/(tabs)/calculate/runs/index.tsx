import { RunsScreen } from '@/components/screens/calculate/runs-screen';

/** /calculate/runs: saved runs, newest first. */
export default RunsScreen;
