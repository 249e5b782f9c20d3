import { defaultBaseConfig, defineConfig, mergeConfigs } from '@chakra-ui/react';
import {
  alertSlotRecipe,
  animationStyles,
  badgeRecipe,
  breakpoints,
  buttonRecipe,
  checkboxSlotRecipe,
  checkmarkRecipe,
  codeRecipe,
  cssVarsPrefix,
  cssVarsRoot,
  dialogSlotRecipe,
  fieldSlotRecipe,
  globalCss,
  headingRecipe,
  iconRecipe,
  inputRecipe,
  keyframes,
  layerStyles,
  linkRecipe,
  listSlotRecipe,
  menuSlotRecipe,
  nativeSelectSlotRecipe,
  semanticTokens,
  spinnerRecipe,
  tableSlotRecipe,
  tabsSlotRecipe,
  textStyles,
  tokens,
} from '@chakra-ui/react/theme';

/**
 * Chakra's own theme with the recipes of only the components Catline draws (Chakra's bundle
 * optimisation guide): the full set of recipes is most of the theme's weight, and the theme loads
 * before the first screen. A component left out here draws unstyled, so a new Chakra component
 * used on a screen needs its recipe (or slot recipe) added to the lists below; components without
 * a recipe (Box, Stack, Grid, Text, Portal…) need nothing.
 */
export const chakraBaseConfig = mergeConfigs(
  defaultBaseConfig,
  defineConfig({
    preflight: true,
    cssVarsPrefix,
    cssVarsRoot,
    globalCss,
    theme: {
      breakpoints,
      keyframes,
      tokens,
      semanticTokens,
      textStyles,
      layerStyles,
      animationStyles,
      recipes: {
        badge: badgeRecipe,
        button: buttonRecipe,
        checkmark: checkmarkRecipe,
        code: codeRecipe,
        heading: headingRecipe,
        icon: iconRecipe,
        input: inputRecipe,
        link: linkRecipe,
        spinner: spinnerRecipe,
      },
      slotRecipes: {
        alert: alertSlotRecipe,
        checkbox: checkboxSlotRecipe,
        dialog: dialogSlotRecipe,
        field: fieldSlotRecipe,
        list: listSlotRecipe,
        menu: menuSlotRecipe,
        nativeSelect: nativeSelectSlotRecipe,
        table: tableSlotRecipe,
        tabs: tabsSlotRecipe,
      },
    },
  }),
);
