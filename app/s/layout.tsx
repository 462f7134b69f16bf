import { Providers } from "@/components/providers";

/** The owner summary: its answer form posts through TanStack Query. */
export default function OwnerSummaryLayout({ children }: { children: React.ReactNode }) {
  return <Providers>{children}</Providers>;
}
