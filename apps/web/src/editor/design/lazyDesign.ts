import { lazy } from "react";

/*
 * The editor's design parts (section and material dialog, code combinations, beam theory, member
 * checks, the section at x) with the design components and the engine's design module are not on
 * screen when a beam opens, so they load as their own chunks: on first use, or when the browser is
 * idle after the editor's first paint (preloadDesignParts), so that opening them stays instant.
 */
const sectionDialog = () => import("./SectionDialog");
const generateDialog = () => import("./GenerateDialog");
const theoryDetails = () => import("./TheoryDetails");
const editorChecks = () => import("./EditorChecks");
const sectionAtCursor = () => import("./SectionAtCursor");

export const SectionDialog = lazy(async () => ({ default: (await sectionDialog()).SectionDialog }));
export const GenerateDialog = lazy(async () => ({ default: (await generateDialog()).GenerateDialog }));
export const TheoryDetails = lazy(async () => ({ default: (await theoryDetails()).TheoryDetails }));
export const EditorChecks = lazy(async () => ({ default: (await editorChecks()).EditorChecks }));
export const SectionAtCursor = lazy(async () => ({ default: (await sectionAtCursor()).SectionAtCursor }));

/** Starts loading every part (the browser caches the modules; lazy() then resolves at once). */
export function preloadDesignParts(): void {
  for (const load of [sectionDialog, generateDialog, theoryDetails, editorChecks, sectionAtCursor]) void load().catch(() => {});
}
