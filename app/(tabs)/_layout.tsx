import { AppShell } from '@/components/shell/app-shell';

/** The five top-level sections share one shell (side rail when wide, bottom tabs on phones), for signed-in people only. */
export default AppShell;
