/** How far a project has come, counted on the server for its overview page. */
export interface ProjectProgress {
  /** Routes with at least two surveyed points (a line can be laid on them). */
  surveyedRoutes: number;
  routes: number;
  lines: number;
}

export interface NextStep {
  title: string;
  text: string;
  href: string;
  action: string;
}

/**
 * What to do next on a project, for someone who may do it: a route first (surveyors and designers),
 * then a line on it (designers). Null once both exist or when the person's role does neither.
 */
export function nextStepOf(
  projectId: string,
  progress: ProjectProgress,
  may: { survey: boolean; design: boolean },
): NextStep | null {
  const base = `/projects/${projectId}`;
  if (progress.surveyedRoutes === 0 && may.survey) {
    return progress.routes === 0
      ? {
          title: 'Next: bring in the pipe route',
          text: 'Import the track walked along the route (CSV or GPX from a phone or handheld receiver, a station table or a level book), or sketch one on the Survey routes page.',
          href: `${base}/routes/import`,
          action: 'Import a route',
        }
      : {
          title: 'Next: survey the route',
          text: 'No route has two points yet. Add its stations on the route page, or import the walked track.',
          href: `${base}/routes`,
          action: 'Open the routes',
        };
  }
  if (progress.surveyedRoutes > 0 && progress.lines === 0 && may.design) {
    return {
      title: 'Next: start a line',
      text: 'Lay a pipeline on the surveyed route: pick the route and name the line, then set its pipe, start and end on the long profile.',
      href: `${base}/lines`,
      action: 'Start a line',
    };
  }
  return null;
}
