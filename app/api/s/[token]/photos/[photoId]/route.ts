import { photoQuerySchema } from "@/lib/contracts/attachments";
import { rawTokenPhotoParamsSchema } from "@/lib/contracts/owner-summary";
import { readSharedPhoto } from "@/lib/server/attachments";
import { handler } from "@/lib/server/handler";
import { tokenFromParams } from "@/lib/server/public-token";

/** A photo the shop marked shareable, through a live link to its case. */
export const GET = handler(
  { public: true, params: rawTokenPhotoParamsSchema, query: photoQuerySchema },
  async ({ params, query }) => {
    const bytes = await readSharedPhoto({
      token: tokenFromParams(params),
      attachmentId: params.photoId,
      size: query.size,
    });
    return new Response(new Uint8Array(bytes), {
      headers: {
        "content-type": "image/jpeg",
        "cache-control": "private, no-store",
        "x-content-type-options": "nosniff",
        "referrer-policy": "no-referrer",
      },
    });
  },
);
