/** The signed-in app's sections, in the order a maker's work flows. */
export const navItems: ReadonlyArray<{ href: string; label: string }> = [{ href: "/overview", label: "Overview" }];
