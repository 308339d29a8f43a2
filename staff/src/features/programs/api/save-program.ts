import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { programSettingsSchema, type ProgramSettingsInput } from "#shared/engine/index";
import { apiFetch } from "#shared/ui/index";

const savedSchema = z.object({ version: z.number().int(), settings: programSettingsSchema.optional() });

/** The version number is the server's to give; the body is the settings alone. */
export type ProgramSettingsBody = Omit<ProgramSettingsInput, "version">;

export async function saveProgram(settings: ProgramSettingsBody): Promise<{ version: number }> {
  return apiFetch("/api/programs", { method: "POST", body: { settings }, schema: savedSchema });
}

/** Saves the settings as the company's next program version; plans already made keep theirs. */
export function useSaveProgram() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveProgram,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["programs"] }),
  });
}
