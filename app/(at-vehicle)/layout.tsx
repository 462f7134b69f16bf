import { ShopShell } from "../shop-shell";

/**
 * The interview at the vehicle: the same shell as every signed-in page, without TanStack Query's
 * client in the first load. The parts of the interview that query (the spec matches, the findings)
 * bring the client with them when they load (components/providers.tsx).
 */
export default function AtVehicleLayout({ children }: { children: React.ReactNode }) {
  return <ShopShell>{children}</ShopShell>;
}
