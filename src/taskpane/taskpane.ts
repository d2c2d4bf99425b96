// Placeholder pane entry; the catalogue browser, templates and function guide replace it.
export {};
