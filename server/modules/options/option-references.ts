import type { OptionSpace } from "../../../shared/schemas/options.ts";
import type { CatalogRow } from "../catalog/catalog.repository.ts";

/**
 * What the option's ids point at must exist: each space is a space of this project (once),
 * each vent action and replaced vent names a surveyed vent of that space, and each added
 * item is an active item of the company's catalog (one the option already used may stay
 * after it was retired). Answers field path → message, empty when all is well.
 */
export function optionReferenceProblems(
  spaces: readonly OptionSpace[],
  projectSpaces: readonly { id: string; vents: readonly { id: string }[] }[],
  catalogById: ReadonlyMap<string, Pick<CatalogRow, "isActive" | "unit">>,
  alreadyUsedItemIds: ReadonlySet<string> = new Set(),
): Record<string, string> {
  const fields: Record<string, string> = {};
  const seenSpaces = new Set<string>();
  spaces.forEach((optionSpace, i) => {
    const at = `spaces.${i}`;
    const space = projectSpaces.find((s) => s.id === optionSpace.spaceId);
    if (!space) {
      fields[`${at}.spaceId`] = "That attic space is not part of this project.";
      return;
    }
    if (seenSpaces.has(space.id)) fields[`${at}.spaceId`] = "This attic space is listed twice in the option.";
    seenSpaces.add(space.id);
    const ventIds = new Set(space.vents.map((v) => v.id));
    for (const ventId of Object.keys(optionSpace.ventActions)) {
      if (!ventIds.has(ventId)) fields[`${at}.ventActions.${ventId}`] = "No surveyed vent of this space has this id.";
    }
    const addedIds = new Set<string>();
    optionSpace.added.forEach((added, j) => {
      const item = catalogById.get(added.catalogItemId);
      if (!item || (!item.isActive && !alreadyUsedItemIds.has(added.catalogItemId))) {
        fields[`${at}.added.${j}.catalogItemId`] = "Choose an active item of your catalog.";
      } else if (item.unit === "each" && !Number.isInteger(added.quantity)) {
        fields[`${at}.added.${j}.quantity`] = "An item counted each takes a whole number.";
      }
      if (addedIds.has(added.id)) fields[`${at}.added.${j}.id`] = `The id "${added.id}" is used twice in this space.`;
      addedIds.add(added.id);
      if (added.replacesVentId !== undefined && !ventIds.has(added.replacesVentId)) {
        fields[`${at}.added.${j}.replacesVentId`] = "No surveyed vent of this space has this id.";
      }
    });
  });
  return fields;
}
