/** A native <select> styled like the text fields. */
export const selectClass =
  "block min-h-11 rounded-md border border-soot-500/60 bg-white px-3 text-base text-soot-900 focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300";

export const inputClass =
  "block min-h-11 w-full rounded-md border border-soot-500/60 bg-white px-3 text-base text-soot-900 placeholder:text-soot-500 focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300";
