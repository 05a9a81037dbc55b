/**
 * The editor's number field as a director types into it: a decimal comma and the field's unit
 * are understood, anything else is refused beside the field with its name and unit (keeping what
 * was typed), the engine's own refusal is shown the same way, the arrow keys step, and a value
 * changed elsewhere (a drag, undo) shows up unless the field is being typed in.
 */
import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { NumberField } from "~/components/editor/number-field";

function field(props: { unit?: string; value?: number; refuse?: (v: number) => string | null } = {}) {
  const onValue = vi.fn((v: number) => props.refuse?.(v) ?? null);
  const view = render(
    <NumberField label="Track width" unit={props.unit ?? "m"} value={props.value ?? 3} onValue={onValue} />,
  );
  const input = screen.getByLabelText("Track width (m)", { exact: false }) as HTMLInputElement;
  return { input, onValue, view };
}

const type = (input: HTMLInputElement, text: string) => fireEvent.change(input, { target: { value: text } });

describe("number field", () => {
  it("shows the value and names the unit in its label", () => {
    const { input } = field({ value: 3.25 });
    expect(input.value).toBe("3.25");
    expect(screen.getByLabelText("Track width (m)")).toBe(input);
  });

  it.each([
    ["3,5", 3.5],
    [" 4.2 ", 4.2],
    ["4.2 m", 4.2],
    ["4.2m", 4.2],
    ["-0,75", -0.75],
    [".5", 0.5],
  ])("reads %j as %d", (text, expected) => {
    const { input, onValue } = field();
    type(input, text);
    expect(onValue).toHaveBeenCalledWith(expected);
    expect(screen.queryByRole("alert")).toBeNull();
    expect(input.getAttribute("aria-invalid")).toBeNull();
  });

  it("reads degrees written with the degree sign", () => {
    const onValue = vi.fn(() => null);
    render(<NumberField label="Face angle" unit="deg" value={30} onValue={onValue} />);
    type(screen.getByLabelText("Face angle (deg)") as HTMLInputElement, "32,5°");
    expect(onValue).toHaveBeenCalledWith(32.5);
  });

  it.each(["", "abc", "3.5 ft", "1,000.5", "1.000,5", "3..5", "0x10", "Infinity", "m"])(
    "refuses %j beside the field and keeps what was typed",
    (text) => {
      const { input, onValue } = field();
      type(input, text);
      expect(onValue).not.toHaveBeenCalled();
      expect(screen.getByRole("alert").textContent).toBe("Track width must be a number (m).");
      expect(input.value).toBe(text);
      expect(input.getAttribute("aria-invalid")).toBe("true");
      expect(input.getAttribute("aria-describedby")).toBe(screen.getByRole("alert").id);
    },
  );

  it("shows the check's own refusal with the field's name, and clears it once a good value comes", () => {
    const { input, onValue } = field({ refuse: (v) => (v < 1 ? "must be at least 1 m" : null) });
    type(input, "0,5");
    expect(onValue).toHaveBeenLastCalledWith(0.5);
    expect(screen.getByRole("alert").textContent).toBe("Track width must be at least 1 m.");
    type(input, "2,5");
    expect(onValue).toHaveBeenLastCalledWith(2.5);
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("steps with the arrow keys from what is typed", () => {
    const { input, onValue } = field({ value: 3 });
    fireEvent.keyDown(input, { key: "ArrowUp" });
    expect(onValue).toHaveBeenLastCalledWith(4);
    expect(input.value).toBe("4");
    fireEvent.keyDown(input, { key: "ArrowDown" });
    fireEvent.keyDown(input, { key: "ArrowDown" });
    expect(onValue).toHaveBeenLastCalledWith(2);
    type(input, "nonsense");
    onValue.mockClear();
    fireEvent.keyDown(input, { key: "ArrowUp" });
    expect(onValue).not.toHaveBeenCalled();
  });

  it("follows a value changed elsewhere, but never while it is being typed in", () => {
    const { input, view } = field({ value: 3 });
    const rerender = (value: number) =>
      view.rerender(<NumberField label="Track width" unit="m" value={value} onValue={() => null} />);
    rerender(4.5);
    expect(input.value).toBe("4.5");
    fireEvent.focus(input);
    type(input, "5,");
    rerender(6);
    expect(input.value).toBe("5,");
    fireEvent.blur(input);
    rerender(7);
    expect(input.value).toBe("7");
  });
});
