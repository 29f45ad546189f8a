import type { UseFormSetError } from "react-hook-form";
import { describe, expect, it, vi } from "vitest";
import { cryostatInput, lookupOf, parsed } from "../../../../shared/design/invented-library.test-helpers";
import { MaterialReferenceError, toAssembly } from "../../../../shared/design/to-assembly";
import type { DesignContentInput } from "../../../../shared/schemas/design";
import { ApiError } from "../../../lib/api-client";
import { markDesignErrors } from "./server-field-errors";

const setErrorSpy = () => vi.fn() as unknown as UseFormSetError<DesignContentInput> & ReturnType<typeof vi.fn>;
const invalid = (fields: { path: string; message: string }[], message = "The design has problems") => new ApiError({ code: "invalid_input", message, status: 400, fields });

describe("markDesignErrors", () => {
  it("marks each field issue on the form, stripping the save's content. prefix", () => {
    const setError = setErrorSpy();
    const messages = markDesignErrors(
      invalid([
        { path: "content.layup.1.spacer", message: "layup.1.spacer is required for the layer-by-layer model" },
        { path: "content.vacuum.pressure_Pa", message: "vacuum.pressure_Pa must be from 0 to 100000 Pa" },
      ]),
      setError,
      "content.",
    );
    expect(setError).toHaveBeenCalledTimes(2);
    expect(setError).toHaveBeenNthCalledWith(1, "layup.1.spacer", { type: "server", message: "layup.1.spacer is required for the layer-by-layer model" });
    expect(setError).toHaveBeenNthCalledWith(2, "vacuum.pressure_Pa", { type: "server", message: "vacuum.pressure_Pa must be from 0 to 100000 Pa" });
    expect(messages).toEqual(["layup.1.spacer is required for the layer-by-layer model", "vacuum.pressure_Pa must be from 0 to 100000 Pa"]);
  });

  it("leaves a path without the prefix as it is, and marks nothing for an issue on the whole content", () => {
    const setError = setErrorSpy();
    const messages = markDesignErrors(invalid([{ path: "layup.0.reflector", message: "a" }, { path: "content.", message: "b" }]), setError, "content.");
    expect(setError).toHaveBeenCalledTimes(1);
    expect(setError).toHaveBeenCalledWith("layup.0.reflector", { type: "server", message: "a" });
    expect(messages).toEqual(["a", "b"]);
  });

  it("returns the message alone for an error without field issues, and a plain sentence for anything else", () => {
    const setError = setErrorSpy();
    expect(markDesignErrors(new ApiError({ code: "conflict", message: "Revision 4 is no longer the latest", status: 409 }), setError)).toEqual(["Revision 4 is no longer the latest"]);
    expect(markDesignErrors(new Error("offline"), setError)).toEqual(["offline"]);
    expect(markDesignErrors("what", setError)).toEqual(["Something went wrong. Try again."]);
    expect(setError).not.toHaveBeenCalled();
  });

  it("puts a bad library reference beside the form field that holds it", () => {
    // The server answers a MaterialReferenceError with one issue whose path is error.field.
    const content = parsed(cryostatInput(), (d) => ((d.layup[2] as { spacer?: unknown }).spacer = null));
    let error: MaterialReferenceError | undefined;
    try {
      toAssembly(content, lookupOf());
    } catch (e) {
      error = e as MaterialReferenceError;
    }
    expect(error).toBeInstanceOf(MaterialReferenceError);
    const setError = setErrorSpy();
    markDesignErrors(invalid([{ path: error!.field, message: error!.message }]), setError, "content.");
    expect(setError).toHaveBeenCalledWith("layup.2.spacer", { type: "server", message: error!.message });
    // The path walks the form's own values down to that field.
    const value = "layup.2.spacer".split(".").reduce<unknown>((v, key) => (v as Record<string, unknown>)[key], content);
    expect(value).toBeNull();
  });
});
