/**
 * The compiled lessons: every content/<module>/<lesson>.mdx becomes its own lazily
 * loaded chunk. Quiz definitions (content/quizzes) are never imported by the client.
 */
import { useQuery } from "@tanstack/react-query";
import type { ComponentType } from "react";
import type { MDXComponents } from "mdx/types";

export interface LessonFrontmatter {
  title?: string;
  summary?: string;
  module?: string;
  order?: number;
  minutes?: number;
  objectives?: string[];
  quiz?: string;
}

export interface LessonModule {
  default: ComponentType<{ components?: MDXComponents }>;
  frontmatter?: LessonFrontmatter;
}

const loaders = import.meta.glob<LessonModule>("/content/*/*.mdx");

export function lessonModuleKey(moduleSlug: string, lessonSlug: string): string {
  return `/content/${moduleSlug}/${lessonSlug}.mdx`;
}

export function hasLessonModule(moduleSlug: string, lessonSlug: string): boolean {
  return Object.hasOwn(loaders, lessonModuleKey(moduleSlug, lessonSlug));
}

export function loadLessonModule(moduleSlug: string, lessonSlug: string): Promise<LessonModule> {
  const loader = loaders[lessonModuleKey(moduleSlug, lessonSlug)];
  if (!loader) return Promise.reject(new Error("That lesson does not exist."));
  return loader();
}

export function useLessonModule(moduleSlug: string, lessonSlug: string) {
  return useQuery({
    queryKey: ["lesson-module", moduleSlug, lessonSlug],
    queryFn: () => loadLessonModule(moduleSlug, lessonSlug),
    staleTime: Infinity,
    gcTime: Infinity,
    retry: false,
  });
}
