import { AreaStack } from '@/session/area-stack';

/** Running the shop (accounts, settings): admin accounts only. */
export default function AdminAreaLayout() {
  return <AreaStack area="admin" />;
}
