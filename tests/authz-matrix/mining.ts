import { ANY_SIGNED_IN, SAMPLE_ID, type MatrixRow } from "./types";

const CURATE: MatrixRow["allow"] = ["admin", "curator"];

// Upload, articles, statements, procedures (the mining feature).
export const miningRows: MatrixRow[] = [
  { file: "app/(app)/upload/page.tsx", path: "/upload", method: "PAGE", allow: CURATE },
  { file: "app/(app)/articles/page.tsx", path: "/articles", method: "PAGE", allow: ANY_SIGNED_IN },
  { file: "app/(app)/articles/[id]/page.tsx", path: `/articles/${SAMPLE_ID}`, method: "PAGE", allow: ANY_SIGNED_IN },
  { file: "app/(app)/practices/procedures/page.tsx", path: "/practices/procedures", method: "PAGE", allow: CURATE },
  { file: "app/api/uploads/route.ts", path: "/api/uploads", method: "POST", allow: CURATE, body: { metadata: null } },
  { file: "app/api/uploads/[batchId]/route.ts", path: `/api/uploads/${SAMPLE_ID}`, method: "GET", allow: CURATE },
  {
    file: "app/api/uploads/[batchId]/files/route.ts",
    path: `/api/uploads/${SAMPLE_ID}/files?name=a.txt`,
    method: "POST",
    allow: CURATE,
    body: "Reliability above .70.",
  },
  { file: "app/api/articles/route.ts", path: "/api/articles", method: "GET", allow: ANY_SIGNED_IN },
  { file: "app/api/articles/[id]/route.ts", path: `/api/articles/${SAMPLE_ID}`, method: "GET", allow: ANY_SIGNED_IN },
  {
    file: "app/api/articles/[id]/status/route.ts",
    path: `/api/articles/${SAMPLE_ID}/status`,
    method: "GET",
    allow: ANY_SIGNED_IN,
  },
  {
    file: "app/api/articles/[id]/route.ts",
    path: `/api/articles/${SAMPLE_ID}`,
    method: "PATCH",
    allow: CURATE,
    body: { title: "", authors: [], venueId: null, year: null, doi: "", licence: "" },
  },
  {
    file: "app/api/articles/[id]/remine/route.ts",
    path: `/api/articles/${SAMPLE_ID}/remine`,
    method: "POST",
    allow: CURATE,
  },
  {
    file: "app/api/articles/[id]/statements/[statementId]/review/route.ts",
    path: `/api/articles/${SAMPLE_ID}/statements/${SAMPLE_ID}/review`,
    method: "PUT",
    allow: CURATE,
    body: { verdict: "correct" },
  },
  { file: "app/api/procedures/route.ts", path: "/api/procedures", method: "GET", allow: CURATE },
  { file: "app/api/procedures/route.ts", path: "/api/procedures", method: "POST", allow: CURATE, body: {} },
  {
    file: "app/api/procedures/[id]/route.ts",
    path: `/api/procedures/${SAMPLE_ID}`,
    method: "PUT",
    allow: CURATE,
    body: {},
  },
];
