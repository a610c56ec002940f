// The page's single wiring point (core, stores, renderer, components). Filled in by the canvas work.
document.body.textContent = 'Ninefold is starting.';
