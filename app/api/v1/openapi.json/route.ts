// GET /api/v1/openapi.json — the OpenAPI 3.1 document, generated from the contract's zod schemas.
import { openApiDocument } from "@/lib/api-contract/openapi";
import { openApiResponse } from "@/lib/api-contract/service-responses";
import { apiGet, apiOptions, plainJson } from "@/server/api";
import { env } from "@/server/env";

export const GET = apiGet(async (req) => plainJson(req, openApiResponse, openApiDocument(env().APP_URL)));
export const OPTIONS = apiOptions;
