/** The look of the plan screen's and station sheet's number tables (borders, not colour, separate rows). */
export const tableClass =
  "w-full border-collapse text-left text-sm tabular-nums [&_caption]:mb-2 [&_caption]:text-left [&_caption]:font-bold [&_td]:border-b [&_td]:border-slate-300 [&_td]:px-2 [&_td]:py-1 [&_th]:border-b [&_th]:border-slate-400 [&_th]:px-2 [&_th]:py-1";
