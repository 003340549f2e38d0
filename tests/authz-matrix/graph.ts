import { ANY_SIGNED_IN, SAMPLE_ID, type MatrixRow } from "./types";

const CURATE: MatrixRow["allow"] = ["admin", "curator"];

// Works, practices, trails, source checks, dashboards (the citation-graph feature).
export const graphRows: MatrixRow[] = [
  { file: "app/(app)/dashboards/page.tsx", path: "/dashboards", method: "PAGE", allow: ANY_SIGNED_IN },
  {
    file: "app/(app)/dashboards/[name]/page.tsx",
    path: "/dashboards/practice-over-time",
    method: "PAGE",
    allow: ANY_SIGNED_IN,
  },
  { file: "app/(app)/trails/page.tsx", path: "/trails", method: "PAGE", allow: ANY_SIGNED_IN },
  {
    file: "app/(app)/trails/[statementId]/page.tsx",
    path: `/trails/${SAMPLE_ID}`,
    method: "PAGE",
    allow: ANY_SIGNED_IN,
  },
  { file: "app/(app)/works/page.tsx", path: "/works", method: "PAGE", allow: ANY_SIGNED_IN },
  { file: "app/(app)/works/[id]/page.tsx", path: `/works/${SAMPLE_ID}`, method: "PAGE", allow: ANY_SIGNED_IN },
  { file: "app/(app)/practices/page.tsx", path: "/practices", method: "PAGE", allow: ANY_SIGNED_IN },
  {
    file: "app/api/dashboards/[name]/route.ts",
    path: "/api/dashboards/practice-over-time",
    method: "GET",
    allow: ANY_SIGNED_IN,
  },
  {
    file: "app/api/trails/[statementId]/route.ts",
    path: `/api/trails/${SAMPLE_ID}`,
    method: "GET",
    allow: ANY_SIGNED_IN,
  },
  { file: "app/api/practices/route.ts", path: "/api/practices", method: "GET", allow: ANY_SIGNED_IN },
  { file: "app/api/practices/route.ts", path: "/api/practices", method: "POST", allow: CURATE, body: {} },
  { file: "app/api/works/[id]/route.ts", path: `/api/works/${SAMPLE_ID}`, method: "GET", allow: ANY_SIGNED_IN },
  { file: "app/api/works/[id]/route.ts", path: `/api/works/${SAMPLE_ID}`, method: "PATCH", allow: CURATE, body: {} },
  {
    file: "app/api/works/[id]/merge/route.ts",
    path: `/api/works/${SAMPLE_ID}/merge`,
    method: "POST",
    allow: CURATE,
    body: {},
  },
  {
    file: "app/api/works/[id]/split/route.ts",
    path: `/api/works/${SAMPLE_ID}/split`,
    method: "POST",
    allow: CURATE,
    body: {},
  },
  { file: "app/api/source-checks/route.ts", path: "/api/source-checks", method: "POST", allow: CURATE, body: {} },
];
