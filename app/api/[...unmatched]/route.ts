import { NextResponse } from "next/server";

// Any /api address no route handler has: a JSON 404 like every other refusal of the API, for any method.
const notFound = () => NextResponse.json({ error: "No such address in the Spanwright API." }, { status: 404 });

export const GET = notFound;
export const HEAD = notFound;
export const POST = notFound;
export const PUT = notFound;
export const PATCH = notFound;
export const DELETE = notFound;
export const OPTIONS = notFound;
