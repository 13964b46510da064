// Sub-commands beyond `calc` register themselves here (one import each).
export {};
