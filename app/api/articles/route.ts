import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { ArticleFilters, listArticles } from "@/lib/corpus/articles";

export const GET = route({ permission: "corpus:read", query: ArticleFilters }, async ({ query }) =>
  listArticles(getDb(), query),
);
