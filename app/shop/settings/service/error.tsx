"use client";

// Same recovery as the workspace: nothing saved is lost, try again.
export { default } from "@/app/shop/error";
