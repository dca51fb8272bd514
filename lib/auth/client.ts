"use client";
// The browser side of better-auth: password sign-in for staff, e-mail link for riders.
import { adminClient, magicLinkClient } from "better-auth/client/plugins";
import { createAuthClient } from "better-auth/react";

export const authClient = createAuthClient({ plugins: [magicLinkClient(), adminClient()] });
