/**
 * The build steps of a can heater and the cautions that go with each. Plain
 * data so the build sheet and its tests read the same words. The cautions are
 * common practice; local codes and licensed trades have the last word.
 */
export interface BuildStep {
  title: string;
  text: string;
  caution?: string;
}

export function buildSteps(p: { cans: number; holes: number; holesPerCan: number; columns: number; rows: number }): BuildStep[] {
  return [
    {
      title: "Prepare the cans",
      text: `Take ${p.cans} washed cans (claimed for this unit). Cut the top off each one.`,
      caution: "Cut can edges are razor sharp: wear cut-resistant gloves and keep the offcuts in a closed bin.",
    },
    {
      title: "Punch the bottoms",
      text: `Punch ${p.holesPerCan} holes in each can bottom — ${p.holes} holes in all — so air passes up the column.`,
      caution: "Wear eye protection and hearing protection when grinding, drilling or punching.",
    },
    {
      title: "Glue the columns",
      text: `Join ${p.rows} cans end to end for each of the ${p.columns} columns with high-temperature adhesive, and let them cure.`,
      caution: "Work with adhesives in a well-ventilated space, away from flames; follow the cartridge's label.",
    },
    {
      title: "Paint",
      text: "Paint the columns and the back panel with high-temperature matt black paint.",
      caution: "Spray outdoors or with strong ventilation and a suitable respirator; let the paint cure fully before glazing.",
    },
    {
      title: "Build and insulate the box",
      text: "Build the frame to the outer size above, line the back and sides with insulation, fit the manifolds and seat the columns.",
    },
    {
      title: "Safety controls",
      text: "Fit an over-temperature switch that stops the fan (and so the flow of hot air) if the box overheats, and a backdraft damper so the heater cannot pull cold air into the room at night.",
      caution: "An over-temperature switch and a backdraft damper are part of the build, not options.",
    },
    {
      title: "Wiring",
      text: "Connect the fan and switch.",
      caution: "Mains wiring must be done by a licensed electrician.",
    },
    {
      title: "Glaze and mount",
      text: "Seal the glazing to the frame and mount the box on the wall with its ducts.",
      caution: "A wall opening for the ducts must follow the local building code; check with the building owner and your local authority first.",
    },
  ];
}
