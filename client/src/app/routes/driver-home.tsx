import { DriverHome } from '@/features/home/routes/driver-home';
import { DeviceWalkarounds } from '@/features/walkaround/components/device-walkarounds';

// The app joins the home and the walk-arounds this phone holds.
export function DriverHomeRoute() {
  return <DriverHome onThisPhone={<DeviceWalkarounds />} />;
}
