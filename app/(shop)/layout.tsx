import { Providers } from "@/components/providers";
import { ShopShell } from "../shop-shell";

/** Every signed-in page but the interview: the shell, with TanStack Query's client for the page. */
export default function ShopLayout({ children }: { children: React.ReactNode }) {
  return (
    <Providers>
      <ShopShell>{children}</ShopShell>
    </Providers>
  );
}
