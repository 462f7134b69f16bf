import type { User } from "lucia";
import sharp from "sharp";
import type { Models } from "@/models";
import { createShopWithCase } from "./fixtures";

/** A shop with a submitted (signed-off) case whose owner page is available, and its technician as a Lucia user. */
export async function createSharedCase(models: Models, complaint?: string) {
  const base = await createShopWithCase(models, complaint);
  await base.serviceCase.update({
    status: "signed_off",
    conclusionCause: "overcharge",
    answers: {
      answers: {
        system: {
          refrigerant: "R-134a",
          expansionDevice: "txv",
          electricCompressor: false,
          labelChargeG: 450,
        },
        conditions: { ambientC: 30 },
        running: { ventC: 16 },
        chargeAudit: { recovered: true, recoveredChargeG: 565 },
      },
    },
  });
  const user: User = {
    id: base.technician.id,
    email: base.technician.email,
    name: base.technician.name,
    role: "technician",
    shopId: base.shop.id,
    active: true,
  };
  return { ...base, user };
}

/**
 * A real photo-sized JPEG with EXIF GPS data, as a phone camera writes it (sharp writes the EXIF).
 * The picture is noise, so it does not compress to nothing.
 */
export async function cameraJpeg({ widthPx = 3000, heightPx = 2000 } = {}): Promise<Buffer> {
  const noise = await sharp({
    create: {
      width: widthPx,
      height: heightPx,
      channels: 3,
      background: "#808080",
      noise: { type: "gaussian", mean: 128, sigma: 40 },
    },
  })
    .jpeg({ quality: 85 })
    .withExif({
      IFD0: { Make: "FixturePhone", Model: "Camera 1" },
      IFD3: {
        GPSLatitudeRef: "N",
        GPSLatitude: "44/1 38/1 52/1",
        GPSLongitudeRef: "W",
        GPSLongitude: "63/1 34/1 30/1",
      },
    })
    .toBuffer();
  return noise;
}

export async function screenshotPng(): Promise<Buffer> {
  return sharp({
    create: { width: 800, height: 600, channels: 4, background: { r: 10, g: 111, b: 166, alpha: 1 } },
  })
    .png()
    .toBuffer();
}
