import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/api/errors";
import { formInput, formValues } from "@/lib/forms/form-data";
import { NUMBER_SPECS } from "@/lib/forms/number-input";
import { dropPointInput, pledgeInput } from "@/lib/drives/schemas";

// The FormData step of server actions (lib/api/action.ts): what a plain form
// posts becomes the object the JSON route's schema takes, or field messages.
const fieldsOf = (run: () => unknown) => {
  try {
    run();
  } catch (error) {
    if (error instanceof AppError) return error.fields;
    throw error;
  }
  return null;
};

describe("formValues", () => {
  it("keeps text entries and drops React's $ACTION fields and files", () => {
    const fd = new FormData();
    fd.set("name", "Nell");
    fd.set("$ACTION_ID_abc", "");
    fd.set("$ACTION_REF_1", "");
    fd.set("photo", new File(["x"], "bin.png", { type: "image/png" }));
    expect(formValues(fd)).toEqual({ name: "Nell" });
  });
});

describe("formInput", () => {
  it("reads a pledge the JSON route would take", () => {
    const values = { dropPointId: "8c0c8f5e-6f6a-4a43-9d5c-2c1f0e0b8a11", bags: " 3 ", bringOn: "2026-12-10", name: "", email: "" };
    const parsed = pledgeInput.parse(formInput(values, { numbers: { bags: NUMBER_SPECS.pledgeBags } }));
    expect(parsed).toMatchObject({ bags: 3, bringOn: "2026-12-10", email: "" });
  });

  it("refuses a count that is no whole number with the number boxes' own words, never turning it into another number", () => {
    for (const raw of ["two", "2.5", "-4", "−4"]) {
      expect(fieldsOf(() => formInput({ bags: raw }, { numbers: { bags: NUMBER_SPECS.pledgeBags } }))).toEqual({ bags: "Enter a whole number of bags, like 3." });
    }
    expect(fieldsOf(() => formInput({ bags: "51" }, { numbers: { bags: NUMBER_SPECS.pledgeBags } }))).toEqual({ bags: "Enter no more than 50 bags." });
  });

  it("reads signed coordinates and checkboxes for a drop point", () => {
    const shape = { numbers: { lat: "decimal", lng: "decimal", capacityBags: NUMBER_SPECS.capacityBags }, checkboxes: ["active"] } as const;
    const input = formInput({ name: "South gate", lat: "47.21", lng: "−8.05", capacityBags: "6" }, shape);
    expect(dropPointInput.parse(input)).toMatchObject({ lat: 47.21, lng: -8.05, capacityBags: 6, active: false });
    expect(formInput({ name: "x", active: "on", capacityBags: "6" }, shape)).toMatchObject({ active: true, lat: undefined });
    expect(fieldsOf(() => formInput({ lat: "north", lng: "1", capacityBags: "6" }, shape))).toEqual({ lat: "Enter a number with a point, like 47.21 or −8.05." });
  });
});
