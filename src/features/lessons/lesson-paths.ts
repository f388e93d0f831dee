/** Lesson routes (kept here until src/config/paths.ts adopts them). */
export const lessonPaths = {
  modules: "/learn/modules",
  lesson: (moduleSlug: string, lessonSlug: string) => `/learn/${encodeURIComponent(moduleSlug)}/${encodeURIComponent(lessonSlug)}`,
  lessonPattern: "/learn/:moduleSlug/:lessonSlug",
} as const;
