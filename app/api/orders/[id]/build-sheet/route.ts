// GET /api/orders/[id]/build-sheet (staff): the workshop's build sheet of an order as a PDF.
import { idParams, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { loadBuildSheet } from "@/lib/orders/build-sheet";
import { renderBuildSheet } from "@/lib/orders/build-sheet-pdf";

export const dynamic = "force-dynamic";

export const GET = route({ access: STAFF_ROLES, params: idParams, notFound: "No such order." }, async ({ params }) => {
  const sheet = await loadBuildSheet(params.id);
  const pdf = await renderBuildSheet(sheet);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-length": String(pdf.length),
      "content-disposition": `inline; filename="build-sheet-order-${sheet.orderNumber}.pdf"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
