// Calls Leeway's export route handlers the way Next does: a Request and a params promise.
type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** GET an export of a scenario version; answers the Response. */
export async function getExport(kind: string, scenarioId: number, number: number, query = ""): Promise<Response> {
  const loaded = (await import(`@/app/api/scenarios/[scenarioId]/versions/[number]/exports/${kind}/route`)) as { GET: Handler };
  const url = `http://leeway.test/api/scenarios/${scenarioId}/versions/${number}/exports/${kind}${query}`;
  return loaded.GET(new Request(url), { params: Promise.resolve({ scenarioId: String(scenarioId), number: String(number) }) });
}

/** The lines of a CSV export after its `#` comment lines: the table itself. */
export function tableBody(csv: string): string {
  return csv
    .split("\r\n")
    .filter((line) => !line.startsWith("#"))
    .join("\r\n");
}
