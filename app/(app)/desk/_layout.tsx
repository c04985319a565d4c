import { AreaStack } from '@/session/area-stack';

/** The service desk's customers and quotes: desk accounts, and the admin. */
export default function DeskAreaLayout() {
  return <AreaStack area="desk" />;
}
