// GET /api/uploads/:id[?token=]: a rider's photo, only to staff or to that request's rider (status
// token or e-mail sign-in). Served with the type sniffed at upload, never the rider's file name.
import { findUploadForViewer, type RiderViewer } from "@/db/queries/status";
import { idParams, route } from "@/lib/api/route";
import { AuthError, getSessionUser } from "@/lib/auth/guard";
import { isStaff } from "@/lib/auth/roles";
import { NotFoundError } from "@/lib/errors";
import { PHOTO_TYPES, readUpload, type PhotoContentType } from "@/lib/storage";

export const dynamic = "force-dynamic";

// Public on purpose: the status token is the rider's credential; otherwise a session is required.
export const GET = route(
  { access: "public", params: idParams, notFound: "No such photo." },
  async ({ request, params: { id } }) => {
    const token = new URL(request.url).searchParams.get("token");
    let viewer: RiderViewer | "staff";
    if (token) viewer = { token };
    else {
      const user = await getSessionUser(request.headers);
      if (!user) throw new AuthError(401);
      viewer = isStaff(user.role) ? "staff" : { email: user.email };
    }
    const upload = await findUploadForViewer(id, viewer);
    if (!upload) throw new NotFoundError("No such photo.");
    // The type sniffed at upload; anything else (an old or tampered row) is a download, never rendered.
    const isPhoto = upload.contentType in PHOTO_TYPES;
    const type = isPhoto ? (upload.contentType as PhotoContentType) : "application/octet-stream";
    const ext = isPhoto ? PHOTO_TYPES[upload.contentType as PhotoContentType] : "bin";
    let bytes: Uint8Array;
    try {
      bytes = await readUpload(upload.storageKey);
    } catch (error) {
      if ((error as { code?: string }).code === "ENOENT")
        throw new NotFoundError("The photo's file is missing from storage.");
      throw error;
    }
    return new Response(new Uint8Array(bytes), {
      headers: {
        "Content-Type": type,
        "Content-Length": String(bytes.byteLength),
        "Content-Disposition": `${isPhoto ? "inline" : "attachment"}; filename="photo-${upload.n}.${ext}"`,
        "X-Content-Type-Options": "nosniff",
        "Cache-Control": "private, no-store",
        "Content-Security-Policy": "default-src 'none'; img-src 'self'; sandbox",
      },
    });
  },
);
