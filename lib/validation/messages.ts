// Plain words for zod's generic issues ("Invalid input: expected number, received undefined"),
// for forms that pass it as the parse's `error` option. A schema's own messages still win.
import type { z } from "zod";

type Issue = z.core.$ZodRawIssue;

export function humanIssue(issue: Issue): string | undefined {
  switch (issue.code) {
    case "invalid_type":
      if (issue.input === undefined || issue.input === null || issue.input === "") return issue.expected === "number" ? "Enter a number" : "Required";
      if (issue.expected === "number") return "Enter a number";
      return "Not a valid value";
    case "too_small":
      return issue.origin === "number" ? `At least ${issue.minimum}${issue.inclusive === false ? " (not equal)" : ""}` : "Too short";
    case "too_big":
      return issue.origin === "number" ? `At most ${issue.maximum}` : issue.origin === "string" ? `At most ${issue.maximum} characters` : "Too long";
    case "invalid_value":
      return "Choose one of the options";
    case "not_multiple_of":
      return "A whole number";
    default:
      return undefined;
  }
}
