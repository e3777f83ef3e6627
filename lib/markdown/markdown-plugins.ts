import remarkGfm from "remark-gfm";

import { remarkSafeTree } from "./remark-safe-tree";

// One list for the page and the mail renderer, so both read untrusted Markdown the same way.
export const SAFE_REMARK_PLUGINS = [remarkGfm, remarkSafeTree];
