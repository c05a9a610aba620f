/** A CSV file as a download (private: it depends on who asks). */
export function csvResponse(text: string, filename: string): Response {
  const body = Buffer.from(text, "utf8");
  return new Response(body, {
    status: 200,
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${filename.replace(/[^A-Za-z0-9._-]/g, "_")}"`,
      "Content-Length": String(body.byteLength),
      "Cache-Control": "private, no-store",
    },
  });
}
