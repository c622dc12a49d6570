"use client";
// The field stage, loaded in the browser only: konva would pull in Node's canvas on the server.
import dynamic from "next/dynamic";
import type { FieldStageProps } from "./FieldStage";

const FieldStage = dynamic(() => import("./FieldStage"), {
  ssr: false,
  loading: () => <div className="h-full w-full animate-pulse rounded-lg border border-ink/15 bg-paper-sunk" role="status" aria-label="Loading the field" />,
});

export function FieldCanvas(props: FieldStageProps) {
  return <FieldStage {...props} />;
}
