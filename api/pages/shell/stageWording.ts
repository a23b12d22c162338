// The reading stages in the words the bench uses.
export const STAGE_WORDING: Record<string, string> = {
  before_load: 'before load',
  under_load: 'under load',
  after_unload: 'after unloading',
  before_anneal: 'before anneal',
  after_anneal: 'after anneal',
  inspection: 'inspection',
};
