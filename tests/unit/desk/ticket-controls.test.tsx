// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it } from "vitest";

import { TicketControls } from "@/components/desk/ticket-controls";
import type { ActionState } from "@/lib/actions/action-state";
import type { TicketDetail } from "@/lib/tickets/ticket-types";

const calls: Record<string, string>[] = [];
let answer: (form: Record<string, string>) => ActionState = () => ({ ok: true });

// The page passes the server action down; here a stand-in records what the form sends.
const updateTicketAction = async (_previous: ActionState, form: FormData) => {
  const sent = Object.fromEntries([...form.entries()].map(([k, v]) => [k, String(v)]));
  calls.push(sent);
  return answer(sent);
};

const agentId = "00000000-0000-4000-8000-0000000000a1";
const ticket = {
  id: "00000000-0000-4000-8000-000000000001",
  status: "new",
  priority: "normal",
  assigneeId: null,
  tags: ["melting"],
} as unknown as TicketDetail;
const assignees = [{ id: agentId, name: "Agent Ada" }];

const select = (name: string) => screen.getByLabelText(name) as HTMLSelectElement;
const save = async () => {
  await act(async () => {
    fireEvent.click(screen.getByRole("button", { name: "Save changes" }));
  });
};

beforeEach(() => {
  calls.length = 0;
});
afterEach(cleanup);

describe("desk ticket panel", () => {
  it("shows the saved value after a save and sends only the touched field the next time", async () => {
    answer = (sent) => ({
      ok: true,
      message: "Ticket updated.",
      data: { status: "new", priority: sent.priority ?? "normal", assigneeId: "", tags: sent.tags ?? "melting" },
    });
    render(<TicketControls updateTicketAction={updateTicketAction} vendor="northbeck" ticket={ticket} assignees={assignees} />);
    fireEvent.change(select("Priority"), { target: { value: "high" } });
    await save();
    expect(calls[0]).toMatchObject({ priority: "high", was: JSON.stringify({ priority: "normal" }) });
    expect(calls[0]).not.toHaveProperty("status");
    expect(select("Priority").value).toBe("high");

    fireEvent.change(screen.getByLabelText(/Tags/), { target: { value: "melting, acrylic" } });
    answer = () => ({
      ok: true,
      message: "Ticket updated.",
      data: { status: "new", priority: "high", assigneeId: "", tags: "melting, acrylic" },
    });
    await save();
    expect(calls[1]).toMatchObject({ tags: "melting, acrylic" });
    expect(calls[1]).not.toHaveProperty("priority");
    expect(select("Priority").value).toBe("high");
  });

  it("reports a conflict in words and shows the other person's value", async () => {
    answer = () => ({
      ok: false,
      message: "Someone else changed the priority while you were editing.",
      data: { status: "new", priority: "urgent", assigneeId: "", tags: "melting" },
    });
    render(<TicketControls updateTicketAction={updateTicketAction} vendor="northbeck" ticket={ticket} assignees={assignees} />);
    fireEvent.change(select("Status"), { target: { value: "in_progress" } });
    await save();
    expect(screen.getByRole("alert").textContent).toContain("Someone else changed the priority");
    expect(select("Priority").value).toBe("urgent");
    expect(select("Status").value).toBe("in_progress");
  });

  it("takes a fresh status and assignee from the page after a reply", () => {
    const { rerender } = render(
      <TicketControls updateTicketAction={updateTicketAction} vendor="northbeck" ticket={ticket} assignees={assignees} />,
    );
    rerender(
      <TicketControls
        updateTicketAction={updateTicketAction}
        vendor="northbeck"
        ticket={{ ...ticket, status: "answered", assigneeId: agentId }}
        assignees={assignees}
      />,
    );
    expect(select("Status").value).toBe("answered");
    expect(select("Assignee").value).toBe(agentId);
  });
});
