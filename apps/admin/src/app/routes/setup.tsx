import { Navigate } from 'react-router-dom';
import { paths } from '../../config/paths';

/** Setup opens on its first part; each part has its own address to link and reload. */
export default function SetupRoute() {
  return <Navigate to={paths.setupMachines.getHref()} replace />;
}
