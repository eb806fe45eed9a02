// The sheet's content model is shared with the read-only record view of the pages.
export * from '#shared/sheets/model'
