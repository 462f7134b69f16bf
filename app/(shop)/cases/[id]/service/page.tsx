import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requireUser } from "@/lib/auth/guard";
import { serviceRecordRefusal } from "@/lib/service/record-rules";
import { isAppError } from "@/lib/errors";
import { EXPANSION_DEVICE_LABELS } from "@/lib/vehicles/expansion-devices";
import { getShop } from "@/lib/server/shops";
import { getProfile } from "@/lib/server/profile";
import { getServiceCase, getServiceRecord } from "@/lib/server/service-records";
import { listCylinders } from "@/lib/server/ledger";
import { listSpecMatches } from "@/lib/server/specs";
import { getPartOilAllowances } from "@/lib/server/oil-allowances";
import { ServiceRecordForm } from "@/components/service/service-record-form";

export const metadata: Metadata = { title: "Service record" };

export default async function ServiceRecordPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireUser("cases:read");
  const caseId = Number((await params).id);
  if (!Number.isInteger(caseId) || caseId <= 0) notFound();
  const shopId = user.shopId;
  const serviceCase = await getServiceCase({ shopId, caseId }).catch((error) => {
    if (isAppError(error) && error.status === 404) notFound();
    throw error;
  });
  const [shop, record, cylinders, allowancesMl, profile] = await Promise.all([
    getShop({ shopId }),
    getServiceRecord({ shopId, caseId }),
    listCylinders({ shopId, includeRetired: false }),
    getPartOilAllowances({ shopId }),
    getProfile({ user }),
  ]);
  const matches =
    serviceCase.make && serviceCase.model && serviceCase.year
      ? await listSpecMatches({
          shopId,
          vehicle: {
            year: serviceCase.year,
            make: serviceCase.make,
            model: serviceCase.model,
            engine: serviceCase.engine,
          },
        })
      : [];
  const readOnlyReason =
    serviceRecordRefusal("save", user, {
      caseStatus: serviceCase.status,
      refrigerant: serviceCase.refrigerant,
      startedBy: record ? { id: record.technicianId, name: record.technician } : null,
    })?.notice ?? null;
  return (
    <article className="space-y-4">
      <header>
        <p>
          <Link
            href={`/cases/${caseId}`}
            className="inline-flex min-h-touch items-center font-bold text-glacier-600 underline"
          >
            ← Case {caseId}
          </Link>
        </p>
        <h1 className="text-2xl font-bold">
          Service record: {serviceCase.vehicle ?? "vehicle not recorded"}
        </h1>
        <p className="text-ink-soft">
          {serviceCase.refrigerant ?? "Refrigerant not recorded"} ·{" "}
          {serviceCase.expansionDevice
            ? EXPANSION_DEVICE_LABELS[serviceCase.expansionDevice]
            : "expansion device not recorded"}
          {serviceCase.electricCompressor ? " · electric compressor" : ""}
          {record ? ` · entered by ${record.technician}` : ""}
        </p>
      </header>
      <ServiceRecordForm
        caseId={caseId}
        serviceCase={serviceCase}
        record={record}
        cylinders={cylinders
          .filter((c) => c.refrigerant === serviceCase.refrigerant)
          .map((c) => ({ id: c.id, label: c.label, kind: c.kind, netG: c.netG, fillMessage: c.fillMessage }))}
        specChoices={matches.map((m) => ({
          id: m.row.id,
          description: `${m.row.yearFrom}–${m.row.yearTo} ${m.row.make} ${m.row.model}${m.row.variant ? ` ${m.row.variant}` : ""}, ${m.row.rearAc ? "front and rear A/C" : "front A/C only"}`,
          labelChargeG: m.row.labelChargeG,
          oilType: m.row.oilType,
          totalOilMl: m.row.totalOilMl,
          reasons: m.reasons,
        }))}
        allowancesMl={allowancesMl}
        units={{
          mass: profile.units.mass,
          volume: profile.units.volume,
          gauge: profile.units.pressure,
          temperature: profile.units.temperature,
          vacuum: profile.units.vacuum,
          altitudeM: shop.altitudeM,
          locale: profile.locale ?? shop.locale,
        }}
        readOnlyReason={readOnlyReason}
      />
    </article>
  );
}
