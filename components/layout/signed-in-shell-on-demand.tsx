"use client";

import dynamic from "next/dynamic";

// The signed-in frame through a client-side `next/dynamic`: its code (the app
// header, the group switcher, sign-out) is a chunk of its own that a page
// loads only when it renders the frame, so a visitor on a page anyone may open
// (the planner) loads none of it. The server still renders it in the HTML.
export const SignedInShell = dynamic(() => import("./signed-in-shell").then((m) => m.SignedInShell));
